/**
 * The open mechanism documents of the workbench: one live EMF model per mechanism file, with
 * its editing domain and command stack, shared by the mechanism editor, the views that follow
 * it and the wizards that change it. Every change is one command on that stack, so Edit › Undo
 * takes it back; saving goes through the same validated, atomic, locked save as the command
 * line.
 */
package dev.penduline.ui.internal.document;
