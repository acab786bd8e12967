package dev.penduline.ui.internal.friction;
import java.nio.file.Path;

import org.eclipse.core.resources.IFile;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;

import dev.penduline.services.Cautions;
import dev.penduline.services.InputException;
import dev.penduline.services.StoredFitText;
import dev.penduline.ui.internal.FollowingPart;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.document.MechanismDocuments;
import dev.penduline.ui.internal.friction.FrictionHeader.Tone;

/**
 * The Friction view: follows the mechanism file selected in Project Files and shows the friction
 * fits stored in it — the verdict first, then the estimates with both standard errors and units,
 * fitted against calculated inertia, the comparison of term sets, the sessions and the
 * warnings, the caution last. "Fit Friction…" opens the Friction Fit wizard ({@link FitWizard}),
 * which runs the services of {@code penduline fit} and stores the result; the view then shows it. Widgets are only
 * touched on the UI thread; errors show as the services' messages, never as stack traces.
 */
public final class FrictionPart extends FollowingPart {

    private static final String HINT = "Select a mechanism file (.penduline) in Project Files.";
    private static final String DURATION = "Fit Friction… sets up a fit of the test sessions; several long records"
            + " can take tens of seconds.";

    private FrictionHeader header;
    private StoredFitPanel panel;
    private WizardDialog wizard;
    private FrictionSheet sheet;
    private StoredFitText shownFit;
    private String preferredId;
    private boolean keepOutcome;

    @Override
    protected void build(Composite parent) {
        GridLayoutFactory.swtDefaults().margins(8, 6).spacing(6, 4).applyTo(parent);
        header = new FrictionHeader(parent, this::choose, this::fit);
        header.say(HINT, Tone.HINT);
        panel = new StoredFitPanel(parent);
        Label caution = new Label(parent, SWT.WRAP);
        caution.setText(Cautions.TEXT);
        caution.setFont(JFaceResources.getFontRegistry().getItalic(JFaceResources.DEFAULT_FONT));
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(caution);
    }

    /** Only mechanism files: a parts list has no stored fits. */
    @Override
    protected boolean accepts(IFile file) {
        return MechanismSelection.isMechanismFile(file);
    }

    /** An edit in the editor keeps the last outcome's line (the editor's own fit, say). */
    @Override
    protected void modelChanged(IFile file) {
        keepOutcome = true;
        show(file);
    }

    /**
     * Shows the stored fits of a mechanism file: reads it in a job unless it is shown unchanged.
     *
     * @param file the mechanism file
     */
    @Override
    public void show(IFile file) {
        if (showsUnchanged(file) && !reading()) {
            return;
        }
        if (!file.equals(shownFile())) {
            preferredId = null;
        }
        // A new file, or one changed since the last outcome (a session added, a fit stored by
        // the command line), makes the last outcome stale; the reload after our own fit keeps it.
        if (!keepOutcome) {
            header.say(DURATION, Tone.HINT);
        }
        keepOutcome = false;
        shown(file);
        header.fitEnabled(true);
        header.file(file.getName(), file.getFullPath().toString());
        Path path = MechanismSelection.pathOf(file);
        var open = openDocument(file);
        if (open.isPresent()) {
            // the editor's model, read on the UI thread: nothing to wait for
            stopReading();
            forget();
            apply(FrictionSheet.of(open.get().mechanism(), file.getName(), path.toString()));
            return;
        }
        read("Reading the stored fits of " + file.getName(), true, () -> FrictionSheet.read(path), this::apply);
    }

    private void apply(FrictionSheet result) {
        sheet = result;
        header.file(result.title(), shownFile().getFullPath().toString());
        String keep = preferredId != null ? preferredId : shownFit == null ? null : shownFit.id();
        StoredFitText chosen = keep == null ? null : result.fit(keep).orElse(null);
        if (chosen == null && !result.fits().isEmpty()) {
            chosen = result.fits().get(0);
        }
        header.fits(result.fits(), chosen);
        result.error().ifPresent(e -> header.say(e, Tone.ERROR));
        showFit(chosen);
    }

    private void choose(int index) {
        if (sheet != null && index >= 0 && index < sheet.fits().size()) {
            showFit(sheet.fits().get(index));
        }
    }

    private void showFit(StoredFitText fit) {
        shownFit = fit;
        panel.show(sheet, fit);
    }

    /**
     * Opens the Friction Fit wizard on the shown mechanism file, as the "Fit Friction…" button
     * does; the dialog is modal but this returns at once (the wizard stores the fit itself).
     *
     * @return whether the wizard opened (false while one is open or before a file is shown)
     */
    public boolean fit() {
        if (shownFile() == null || header.isDisposed() || (wizard != null && wizard.getShell() != null)) {
            return false;
        }
        IFile file = shownFile();
        FitWizard w;
        try {
            w = new FitWizard(file, id -> stored(file, id));
        } catch (InputException e) {
            header.say(e.getMessage(), Tone.ERROR);
            return false;
        }
        wizard = new WizardDialog(header.fitButton().getShell(), w);
        wizard.setBlockOnOpen(false);
        wizard.setPageSize(960, 560);
        wizard.open();
        return true;
    }

    private void stored(IFile file, String id) {
        if (header.isDisposed()) {
            return;
        }
        // short: the line shares its row with the list and the button
        header.say(MechanismDocuments.of(file).isPresent() ? "Fit stored in the editor (unsaved)." : "Fit stored.", Tone.NEWS);
        if (file.equals(shownFile())) {
            preferredId = id;
            forget();
            keepOutcome = true;
            show(file);
        }
    }

    /**
     * Picks a stored fit by its place in the list, as the user would.
     *
     * @param index the place (0: the most recent)
     */
    public void pick(int index) {
        header.choose(index);
    }

    /**
     * What the view read from the shown file, for tests.
     *
     * @return the sheet last shown, or null before the first file is read
     */
    public FrictionSheet sheet() {
        return sheet;
    }

    /**
     * The stored fit on display, for tests.
     *
     * @return the fit, or null when none is shown
     */
    public StoredFitText shown() {
        return shownFit;
    }

    /**
     * The Friction Fit wizard's dialog last opened by the button, for tests.
     *
     * @return the dialog (closed once its shell is null), or null before the first
     */
    public WizardDialog wizardDialog() {
        return wizard;
    }

    /**
     * The line under the toolbar, for tests.
     *
     * @return its text
     */
    public String message() {
        return header.message();
    }

    /**
     * The estimates table as the user sees it, for tests.
     *
     * @return the table
     */
    public Table estimatesTable() {
        return panel.estimates();
    }

    /**
     * The "Fit Friction…" button, for tests.
     *
     * @return the button
     */
    public Button fitButton() {
        return header.fitButton();
    }
}
