package dev.penduline.ui.internal.mechanism;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.ILog;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import dev.penduline.services.Cautions;
import dev.penduline.ui.internal.FollowingPart;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.document.MechanismDocument;

/**
 * The Mechanism view: follows the file selected in Project Files (a mechanism file or a parts
 * list) and shows what the services compute for it — the totals with their units, each part's
 * share of the pivot inertia, the warnings and the usual caution. Loading runs in a job; the
 * widgets are only touched on the UI thread. A bad file shows the services' message (file,
 * line, field), never a stack trace.
 */
public final class MechanismPart extends FollowingPart {

    private static final String HINT = "Select a mechanism file (.penduline) or a parts list (.csv) in Project Files.";

    private Label title;
    private Label source;
    private Label message;
    private MechanismTables tables;
    private Label warnings;
    private MechanismSheet sheet;

    @Override
    protected void build(Composite parent) {
        GridLayoutFactory.swtDefaults().margins(8, 6).spacing(6, 4).applyTo(parent);
        Composite header = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(12, 0).applyTo(header);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(header);
        title = new Label(header, SWT.NONE);
        title.setFont(JFaceResources.getHeaderFont());
        title.setText("No mechanism selected");
        source = new Label(header, SWT.NONE);
        source.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_WIDGET_DARK_SHADOW));
        GridDataFactory.fillDefaults().grab(true, false).align(SWT.FILL, SWT.END).applyTo(source);
        message = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(message);
        say(HINT, false);
        tables = new MechanismTables(parent);
        warnings = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(warnings);
        exclude(warnings, true);
        Label caution = new Label(parent, SWT.WRAP);
        caution.setText(Cautions.TEXT);
        caution.setFont(JFaceResources.getFontRegistry().getItalic(JFaceResources.DEFAULT_FONT));
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(caution);
    }

    /** Shows a line above the tables (the hint, progress, or an error in red); null hides it. */
    private void say(String text, boolean error) {
        message.setText(text == null ? "" : text);
        message.setForeground(error ? message.getDisplay().getSystemColor(SWT.COLOR_DARK_RED) : null);
        exclude(message, text == null);
    }

    private static void exclude(Label label, boolean hidden) {
        label.setVisible(!hidden);
        ((GridData) label.getLayoutData()).exclude = hidden;
    }

    /**
     * Shows a file: its live model at once when an editor has it open, else loads it in a job
     * unless it is already shown unchanged.
     *
     * @param file the mechanism file or parts list
     */
    @Override
    public void show(IFile file) {
        var open = openDocument(file);
        if (open.isPresent()) {
            showLive(file, open.get());
            return;
        }
        if (showsUnchanged(file) && !reading()) {
            return;
        }
        shown(file);
        title.setText(file.getName());
        source.setText(file.getFullPath().toString());
        say("Computing the inertia of " + file.getName() + " ...", false);
        title.getParent().getParent().layout(true, true);
        Path path = MechanismSelection.pathOf(file);
        read("Computing the inertia of " + file.getName(), false, () -> {
            try {
                return MechanismSheet.read(path);
            } catch (RuntimeException e) {
                ILog.of(MechanismPart.class).error("inertia of " + path + " failed", e);
                return MechanismSheet.failed(file.getName(), path.toString(),
                        path + ": could not be computed (" + e.getMessage() + "); the error log has the details");
            }
        }, this::apply);
    }

    /** The editor's model, computed on the UI thread: the services take milliseconds for a parts list. */
    private void showLive(IFile file, MechanismDocument document) {
        stopReading();
        shown(file);
        // whatever the stamp, the file is read again once the editor closes
        forget();
        source.setText(file.getFullPath() + " (open in the editor)");
        apply(MechanismSheet.live(document.mechanism(), file.getName(), MechanismSelection.pathOf(file)));
    }

    private void apply(MechanismSheet result) {
        sheet = result;
        title.setText(result.title());
        say(result.error().orElse(null), true);
        tables.show(result);
        List<String> w = result.warnings();
        warnings.setText(w.isEmpty() ? "" : "Warnings:\n  " + String.join("\n  ", w));
        exclude(warnings, w.isEmpty());
        title.getParent().getParent().layout(true, true);
    }

    /**
     * What the view shows now, for tests and for other parts.
     *
     * @return the sheet last shown, or null before the first mechanism is loaded
     */
    public MechanismSheet sheet() {
        return sheet;
    }
}
