/**
 * File › New › Mechanism Project: a workspace project with its mechanism file, empty or
 * imported from a parts list. Start from
 * {@link dev.penduline.ui.internal.wizard.NewMechanismProjectWizard}; the work is in
 * {@link dev.penduline.ui.internal.wizard.MechanismProjectCreation}, which reads the parts
 * list before creating anything, so a bad list leaves the workspace as it was.
 */
package dev.penduline.ui.internal.wizard;
