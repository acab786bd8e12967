package dev.penduline.ui.internal.wizard;

import java.nio.file.Path;
import java.util.OptionalDouble;

import org.eclipse.core.resources.IFile;

import dev.penduline.report.ReportFiles;

/**
 * What the Mechanism Report page asks for, as the job that writes the report takes it.
 *
 * @param mechanism     the workspace mechanism file
 * @param kind          the format
 * @param target        the report file (absolute)
 * @param overwrite     whether an existing file that is not an earlier report may be replaced
 * @param releaseDegree the release angle of the prediction to include (degrees from the hanging
 *                      equilibrium), empty for none
 * @param openInBrowser whether the written report is opened in the system browser
 */
record ReportChoice(IFile mechanism, ReportFiles.Kind kind, Path target, boolean overwrite, OptionalDouble releaseDegree,
        boolean openInBrowser) {
}
