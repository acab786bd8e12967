/** The Swing Trial view: a what-if of release and friction, re-forecast live, stored as a friction hypothesis. */
package dev.penduline.ui.internal.whatif;
