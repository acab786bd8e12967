/**
 * The mechanism editor: one editor per mechanism file, on the file's shared
 * {@link dev.penduline.ui.internal.document.MechanismDocument}, with pages for the parts, the
 * pivot and gravity, the friction hypotheses and test sessions, and the stored fits. Every change
 * is one EMF command on the document's stack (undo, redo, dirty state); values are typed in user
 * units and stored in SI.
 */
package dev.penduline.ui.internal.editor;
