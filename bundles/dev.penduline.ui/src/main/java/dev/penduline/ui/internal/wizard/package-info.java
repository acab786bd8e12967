/**
 * File › New › Mechanism Project: a workspace project with its mechanism file, empty or
 * imported from a parts list. Start from
 * {@link dev.penduline.ui.internal.wizard.NewMechanismProjectWizard}; the work is in
 * {@link dev.penduline.ui.internal.wizard.MechanismProjectCreation}, which reads the parts
 * list before creating anything, so a bad list leaves the workspace as it was.
 * File › Import › Swing Records is {@link dev.penduline.ui.internal.wizard.RecordImportWizard}.
 * File › Export › Mechanism Report is
 * {@link dev.penduline.ui.internal.wizard.MechanismReportWizard}: the report
 * {@code penduline report} writes (the same request to {@code dev.penduline.report}), its target
 * checked on the page by {@code ReportFiles.check}, written in a background job; its public
 * static {@code browser} and {@code clock} are the tests' hooks.
 */
package dev.penduline.ui.internal.wizard;
