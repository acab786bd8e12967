/**
 * The workbench's own parts and the perspective: {@link dev.penduline.ui.internal.ProjectFilesPart}
 * (the workspace tree whose selection the other views follow), the Swing Desk start page, and
 * what the views share: {@link dev.penduline.ui.internal.MechanismSelection} (which selected
 * file a view can show). Figures are written by {@link dev.penduline.services.present.Figures}, as
 * the command line writes them. Views live in packages of their own by concept: {@code mechanism},
 * {@code chart}, {@code wizard}.
 */
package dev.penduline.ui.internal;
