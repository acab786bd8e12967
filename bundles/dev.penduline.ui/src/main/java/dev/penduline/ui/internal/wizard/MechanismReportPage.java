package dev.penduline.ui.internal.wizard;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.eclipse.core.resources.IContainer;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.Status;
import org.eclipse.jface.dialogs.IMessageProvider;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerFilter;
import org.eclipse.jface.window.Window;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.dialogs.ElementTreeSelectionDialog;
import org.eclipse.ui.model.BaseWorkbenchContentProvider;
import org.eclipse.ui.model.WorkbenchLabelProvider;

import dev.penduline.model.Mechanism;
import dev.penduline.report.ReportFiles;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.StoredFit;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.document.MechanismDocument;
import dev.penduline.ui.internal.document.MechanismDocuments;

/**
 * The one page of the Mechanism Report export: the mechanism file, the format, the report file
 * (beside the mechanism by default, following the format until the user picks another), whether
 * a file that is not an earlier report may be replaced, an optional prediction from the latest
 * stored fit, and whether to open the report when it is written. The target is checked with
 * {@link ReportFiles#check} as it is typed, so a record or a mechanism file is refused here.
 */
final class MechanismReportPage extends WizardPage {

    /** The release angle offered at first (degrees), the README's example of the sample hatch. */
    private static final String FIRST_ANGLE = "60";
    private static final double UPRIGHT_DEG = 180;

    private final List<IFile> mechanisms;
    private IFile mechanism;
    private Optional<StoredFit> fit = Optional.empty();
    private String readProblem;
    private boolean followDefault = true;
    private boolean filling;
    private Combo mechanismCombo;
    private Button html;
    private Button markdown;
    private Text target;
    private Button overwrite;
    private Button predict;
    private Text angle;
    private Button open;

    MechanismReportPage(List<IFile> mechanisms, IFile chosen) {
        super("report", "Mechanism Report", null);
        setDescription("Write the report 'penduline report' writes: the mechanism, its test sessions, the stored fit, the"
                + " provenance and the caution, with vector plots. Nothing is fitted again.");
        this.mechanisms = mechanisms;
        this.mechanism = chosen;
    }

    @Override
    public void createControl(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        GridLayoutFactory.swtDefaults().numColumns(3).applyTo(c);
        new Label(c, SWT.NONE).setText("Mechanism file:");
        mechanismCombo = new Combo(c, SWT.READ_ONLY);
        GridDataFactory.fillDefaults().grab(true, false).hint(360, SWT.DEFAULT).applyTo(mechanismCombo);
        mechanismCombo.addListener(SWT.Selection, e -> {
            int i = mechanismCombo.getSelectionIndex();
            chooseMechanism(i < 0 ? null : mechanisms.get(i));
        });
        Button browseMechanism = new Button(c, SWT.PUSH);
        browseMechanism.setText("Browse...");
        browseMechanism.addListener(SWT.Selection, e -> browseMechanism());

        Group format = new Group(c, SWT.NONE);
        format.setText("Format");
        GridLayoutFactory.swtDefaults().applyTo(format);
        GridDataFactory.fillDefaults().span(3, 1).grab(true, false).applyTo(format);
        html = new Button(format, SWT.RADIO);
        html.setText("HTML: one self-contained file (prints to PDF from a browser)");
        markdown = new Button(format, SWT.RADIO);
        markdown.setText("Markdown, with the plots as SVG files in a folder beside it");
        html.setSelection(true);
        html.addListener(SWT.Selection, e -> formatChanged());
        markdown.addListener(SWT.Selection, e -> formatChanged());

        new Label(c, SWT.NONE).setText("Report file:");
        target = new Text(c, SWT.BORDER);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(target);
        target.addListener(SWT.Modify, e -> {
            if (!filling) {
                followDefault = false;
                validate();
            }
        });
        Button browseTarget = new Button(c, SWT.PUSH);
        browseTarget.setText("Browse...");
        browseTarget.addListener(SWT.Selection, e -> browseTarget());

        overwrite = new Button(c, SWT.CHECK);
        overwrite.setText("Replace an existing file that is not an earlier report");
        GridDataFactory.fillDefaults().span(3, 1).applyTo(overwrite);
        overwrite.addListener(SWT.Selection, e -> validate());

        Composite prediction = new Composite(c, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(3).applyTo(prediction);
        GridDataFactory.fillDefaults().span(3, 1).grab(true, false).applyTo(prediction);
        predict = new Button(prediction, SWT.CHECK);
        predict.setText("Include a prediction with the latest stored fit: released from rest at");
        predict.addListener(SWT.Selection, e -> {
            angle.setEnabled(predict.getSelection());
            validate();
        });
        angle = new Text(prediction, SWT.BORDER | SWT.RIGHT);
        angle.setText(FIRST_ANGLE);
        angle.setEnabled(false);
        GridDataFactory.fillDefaults().hint(60, SWT.DEFAULT).applyTo(angle);
        angle.addListener(SWT.Modify, e -> validate());
        new Label(prediction, SWT.NONE).setText("° from the hanging equilibrium");

        open = new Button(c, SWT.CHECK);
        open.setText("Open the report in the system browser when it is written");
        GridDataFactory.fillDefaults().span(3, 1).applyTo(open);

        Label hint = new Label(c, SWT.WRAP);
        hint.setText("An earlier Penduline report at the same place is replaced. A mechanism file or a record is never"
                + " replaced. The report reads the mechanism file as it is saved on disk.");
        GridDataFactory.fillDefaults().span(3, 1).grab(true, false).hint(520, SWT.DEFAULT).indent(0, 8).applyTo(hint);

        setControl(c);
        mechanisms.forEach(f -> mechanismCombo.add(f.getFullPath().toString()));
        if (mechanism != null && !mechanisms.contains(mechanism)) {
            mechanisms.add(mechanism);
            mechanismCombo.add(mechanism.getFullPath().toString());
        }
        chooseMechanism(mechanism);
    }

    private void chooseMechanism(IFile file) {
        mechanism = file;
        mechanismCombo.select(file == null ? -1 : mechanisms.indexOf(file));
        fit = Optional.empty();
        readProblem = null;
        if (file != null) {
            try {
                Mechanism m = MechanismLoader.readMechanism(MechanismSelection.pathOf(file));
                fit = StoredFit.latest(m);
            } catch (InputException e) {
                readProblem = e.getMessage();
            }
        }
        predict.setEnabled(fit.isPresent());
        if (fit.isEmpty()) {
            predict.setSelection(false);
        }
        angle.setEnabled(predict.getSelection());
        if (followDefault) {
            showTarget(defaultTarget());
        }
        validate();
    }

    private void formatChanged() {
        if (!html.getSelection() && !markdown.getSelection()) {
            return;
        }
        if (followDefault) {
            showTarget(defaultTarget());
        } else {
            // a chosen name keeps its place and base name; its extension follows the format
            String text = target.getText().strip();
            for (ReportFiles.Kind k : ReportFiles.Kind.values()) {
                String ext = "." + k.extension();
                if (k != kind() && text.endsWith(ext)) {
                    String changed = text.substring(0, text.length() - ext.length()) + "." + kind().extension();
                    showTarget(changed);
                }
            }
        }
        validate();
    }

    private String defaultTarget() {
        return mechanism == null ? "" : ReportFiles.defaultTarget(MechanismSelection.pathOf(mechanism), kind()).toString();
    }

    private void showTarget(String text) {
        filling = true;
        try {
            target.setText(text);
        } finally {
            filling = false;
        }
    }

    private ReportFiles.Kind kind() {
        return markdown.getSelection() ? ReportFiles.Kind.MARKDOWN : ReportFiles.Kind.HTML;
    }

    private void browseMechanism() {
        ElementTreeSelectionDialog d = new ElementTreeSelectionDialog(getShell(), new WorkbenchLabelProvider(),
                new BaseWorkbenchContentProvider());
        d.setTitle("Mechanism File");
        d.setMessage("Choose the mechanism file (.penduline) to report:");
        d.setInput(ResourcesPlugin.getWorkspace().getRoot());
        d.setAllowMultiple(false);
        d.addFilter(new ViewerFilter() {
            @Override
            public boolean select(Viewer viewer, Object parentElement, Object element) {
                return element instanceof IContainer || element instanceof IFile f && MechanismSelection.isMechanismFile(f);
            }
        });
        d.setValidator(selection -> selection.length == 1 && selection[0] instanceof IFile
                ? Status.OK_STATUS
                : Status.error("Choose a mechanism file (.penduline)."));
        if (mechanism != null) {
            d.setInitialSelection(mechanism);
        }
        if (d.open() == Window.OK && d.getFirstResult() instanceof IFile f) {
            if (!mechanisms.contains(f)) {
                mechanisms.add(f);
                mechanismCombo.add(f.getFullPath().toString());
            }
            chooseMechanism(f);
        }
    }

    private void browseTarget() {
        FileDialog d = new FileDialog(getShell(), SWT.SAVE);
        d.setText("Report File");
        d.setOverwrite(false);
        String ext = kind().extension();
        d.setFilterExtensions(new String[] {"*." + ext, "*.*"});
        d.setFilterNames(new String[] {(kind() == ReportFiles.Kind.HTML ? "HTML" : "Markdown") + " (*." + ext + ")",
            "All files"});
        Optional<Path> now = targetPath();
        if (now.isPresent() && now.get().getParent() != null) {
            d.setFilterPath(now.get().getParent().toString());
            d.setFileName(now.get().getFileName().toString());
        }
        String chosen = d.open();
        if (chosen != null) {
            showTarget(chosen);
            followDefault = false;
            validate();
        }
    }

    private Optional<Path> targetPath() {
        String text = target.getText().strip();
        if (text.isEmpty()) {
            return Optional.empty();
        }
        try {
            return Optional.of(Path.of(text));
        } catch (InvalidPathException e) {
            return Optional.empty();
        }
    }

    private OptionalDouble releaseDegree() {
        if (!predict.getSelection()) {
            return OptionalDouble.empty();
        }
        try {
            double a = Double.parseDouble(angle.getText().strip());
            return Double.isFinite(a) ? OptionalDouble.of(a) : OptionalDouble.empty();
        } catch (NumberFormatException e) {
            return OptionalDouble.empty();
        }
    }

    private void validate() {
        String problem = problem();
        setErrorMessage(problem);
        setPageComplete(problem == null);
        if (problem == null) {
            warn();
        }
    }

    private String problem() {
        if (mechanism == null) {
            return "Choose the mechanism file to report.";
        }
        if (readProblem != null) {
            return readProblem;
        }
        Optional<Path> t = targetPath();
        if (t.isEmpty()) {
            return target.getText().isBlank() ? "Give the report file." : "'" + target.getText().strip()
                    + "' is not a file name.";
        }
        if (!t.get().isAbsolute()) {
            return t.get() + ": give the report file's full path (for example " + defaultTarget() + ").";
        }
        try {
            ReportFiles.check(t.get(), overwrite.getSelection());
        } catch (InputException e) {
            return e.getMessage();
        }
        if (predict.getSelection()) {
            OptionalDouble a = releaseDegree();
            if (a.isEmpty()) {
                return "The release angle '" + angle.getText().strip() + "' is not a number of degrees.";
            }
            if (a.getAsDouble() == 0 || Math.abs(a.getAsDouble()) >= UPRIGHT_DEG) {
                return "The release angle must be between -180° and 180° and not 0°: angles are measured from the hanging"
                        + " equilibrium, 180° is the upright.";
            }
        }
        return null;
    }

    private void warn() {
        Optional<MechanismDocument> document = MechanismDocuments.of(mechanism);
        if (fit.isEmpty()) {
            setMessage(mechanism.getName() + " holds no stored fit: the report will have no fit section and no prediction"
                    + " (fit the friction first for them).", IMessageProvider.WARNING);
        } else if (document.isPresent() && document.get().isDirty()) {
            setMessage(mechanism.getName() + " has unsaved changes in its editor: the report is of the file as saved.",
                    IMessageProvider.WARNING);
        } else if (fit.get().stale().isPresent()) {
            setMessage("The stored fit " + fit.get().id() + " is stale (" + fit.get().stale().get() + "): the report says so.",
                    IMessageProvider.WARNING);
        } else {
            setMessage("The report of " + mechanism.getName() + " with its stored fit " + fit.get().id() + " (" + fit.get().name()
                    + ").", IMessageProvider.INFORMATION);
        }
    }

    /** @return what the page asks for; only when the page is complete */
    ReportChoice choice() {
        return new ReportChoice(mechanism, kind(), targetPath().orElseThrow(), overwrite.getSelection(), releaseDegree(),
                open.getSelection());
    }
}
