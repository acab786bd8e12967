package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.wizard.ProgressMonitorPart;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.ToolBar;
import org.eclipse.swt.widgets.ToolItem;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.ide.IDE;

import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.services.FitWording;
import dev.penduline.services.FrictionIdentification;
import dev.penduline.services.FrictionIdentification.Outcome;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.document.MechanismDocument;
import dev.penduline.ui.internal.document.MechanismDocuments;
import dev.penduline.ui.internal.friction.FitResultsPage;
import dev.penduline.ui.internal.friction.FitSetupPage;
import dev.penduline.ui.internal.friction.FitWizard;
import dev.penduline.ui.internal.friction.FrictionPart;
import dev.penduline.ui.internal.wizard.MechanismProjectCreation;

/**
 * The Friction Fit wizard on an invented two-session mechanism, through its real widgets: the
 * Friction view's "Fit Friction…" button opens it; a run is cancelled with the cancel button of
 * the wizard's progress part and stores nothing; one session, viscous + Coulomb, J0 held and 5 bootstrap refits are
 * chosen in the widgets; Next runs the fit; the last page's verdict and estimate (with ±) must
 * equal what the services and the CLI's wording ({@code FitWording}) give for the same settings
 * (the fit's own accuracy is proven against SciPy and known truths by the physics and reference
 * corpus tests; here the check is equality with the service output); Back stores nothing; Finish
 * stores the fit in the file (read back with {@code MechanismLoader}); with the editor open, Finish
 * adds it to the editor's document as one command that Undo removes.
 */
final class FitWizardCapability implements Capability {

    /** Bound on a short fit of invented 12 s records. */
    private static final long FIT_NANOS = 180_000_000_000L;

    @Override
    public void run(WorkbenchDriver driver) throws Exception {
        Path scratch = Files.createTempDirectory("penduline-fit-wizard-test");
        Path csv = Files.writeString(scratch.resolve("wizard-arm-parts.csv"), TestMechanisms.ROD_AND_DISC,
                StandardCharsets.UTF_8);
        IFile file = MechanismProjectCreation.create("fit-wizard-arm", "Wizard arm (invented)", Optional.of(csv), null)
                .mechanismFile();
        Path path = MechanismSelection.pathOf(file);
        FrictionViewScenario.addInventedSessions(path, new MechanismLoader().load(path), scratch);
        file.getProject().refreshLocal(IResource.DEPTH_INFINITE, null);
        FrictionPart view = (FrictionPart) driver.parts().showPart(PendulineViews.FRICTION, PartState.VISIBLE).getObject();
        driver.reveal(file);
        driver.waitFor("the Friction view to read the two sessions", () -> view.sheet() != null
                && view.sheet().source().equals(path.toString()) && view.sheet().sessions() == 2 ? view.sheet() : null);
        assertEquals("Fit Friction\u2026", view.fitButton().getText(), "the button's name");

        WizardDialog dialog = open(driver, view);
        FitWizard wizard = wizardOf(dialog);
        FitSetupPage setup = wizard.setupPage();
        Table sessions = setup.sessionsTable();
        assertEquals(2, sessions.getItemCount(), "both sessions listed");
        assertEquals("unchanged", sessions.getItem(0).getText(2), "the record state of the first session");
        assertEquals(0, setup.termsChoice().getSelectionIndex(), "automatic term sets by default, as the CLI");
        assertEquals(0, setup.inertiaChoice().getSelectionIndex(), "J0 fitted by default, as the CLI");
        assertEquals(FitSettings.defaults().resamples(), setup.resamplesSpinner().getSelection(),
                "the CLI's --resamples default");
        driver.shot(dialog.getShell(), "fit-wizard-setup.png");

        // A run cancelled with the cancel (stop) button JFace shows beside the progress bar while a
        // run lasts (the dialog's Cancel button is disabled meanwhile) stores nothing and stays on
        // the first page (the most refits the page offers, so that the run lasts until the press).
        setup.resamplesSpinner().setSelection(FitSetupPage.MAX_RESAMPLES);
        boolean[] pressed = new boolean[1];
        driver.display().timerExec(50, new Runnable() {
            @Override
            public void run() {
                if (wizard.running()) {
                    ToolItem stop = stopButton(dialog.getShell());
                    pressed[0] = stop != null && stop.isEnabled();
                    if (pressed[0]) {
                        stop.notifyListeners(SWT.Selection, new Event());
                    }
                } else if (!dialog.getShell().isDisposed()) {
                    driver.display().timerExec(50, this);
                }
            }
        });
        press(dialog, IDialogConstants.NEXT_ID);
        assertTrue(pressed[0], "the progress part's cancel button was not pressed during the run");
        assertSame(setup, dialog.getCurrentPage(), "a cancelled run stays on the first page");
        assertTrue(String.valueOf(setup.getMessage()).contains("cancelled"), "says so: " + setup.getMessage());
        assertTrue(MechanismLoader.readMechanism(path).getFitResults().isEmpty(), "a cancelled run stored something");
        driver.shot(dialog.getShell(), "fit-wizard-cancelled.png");

        // One session, viscous + Coulomb, J0 held, 5 refits: through the widgets.
        TableItem second = sessions.getItem(1);
        second.setChecked(false);
        Event check = new Event();
        check.item = second;
        check.detail = SWT.CHECK;
        sessions.notifyListeners(SWT.Selection, check);
        pick(setup.termsChoice(), 1);
        for (Button term : setup.termButtons()) {
            boolean wanted = term.getText().startsWith("viscous") || term.getText().startsWith("Coulomb");
            if (term.getSelection() != wanted) {
                term.setSelection(wanted);
                term.notifyListeners(SWT.Selection, new Event());
            }
        }
        pick(setup.inertiaChoice(), 1);
        setup.resamplesSpinner().setSelection(5);
        setup.resamplesSpinner().notifyListeners(SWT.Modify, new Event());
        driver.shot(dialog.getShell(), "fit-wizard-chosen.png");
        press(dialog, IDialogConstants.NEXT_ID);
        FitResultsPage results = wizard.resultsPage();
        driver.waitFor("the last page", FIT_NANOS, () -> dialog.getCurrentPage() == results ? results : null);
        driver.shot(dialog.getShell(), "fit-wizard-results.png");

        // The same fit through the services, with the settings the widgets were given.
        MechanismSource source = new MechanismLoader().load(path);
        Mechanism onDisk = MechanismLoader.readMechanism(path);
        FitSettings d = FitSettings.defaults();
        Outcome expected = FrictionIdentification.identify(source,
                FrictionIdentification.sessionsOf(path, List.of(onDisk.getSessions().get(0)), source, false),
                Optional.of(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB)), true,
                d.withResampling(5, d.seed(), d.parallel()), FitControl.none());
        assertEquals("Verdict: " + FitWording.verdict(expected.fit()), results.verdictText(), "the verdict shown");
        FitWording.EstimateLine b = FitWording.estimates(expected.fit()).stream().filter(l -> l.symbol().equals("b"))
                .findFirst().orElseThrow();
        TableItem row = rowOf(results.estimatesTable(), "b");
        assertEquals(b.text(), row.getText(2), "the viscous estimate shown");
        assertTrue(row.getText(2).contains(" ± "), "the estimate carries its ±: " + row.getText(2));
        assertTrue(rowOf(results.estimatesTable(), "J0").getText(2).contains("held at the calculated value"),
                "J0 was held");
        assertEquals(1, results.sessionCombo().getItemCount(), "one session plotted");
        assertEquals(2, results.recordChart().getSeriesSet().getSeries().length, "record and model");
        assertEquals(results.recordChart().getAxisSet().getXAxis(0).getRange().upper,
                results.residualsChart().getAxisSet().getXAxis(0).getRange().upper, 1e-9, "one time axis");

        // Back stores nothing; Next and Finish store the fit in the file (no editor open).
        press(dialog, IDialogConstants.BACK_ID);
        assertSame(setup, dialog.getCurrentPage(), "Back");
        assertTrue(MechanismLoader.readMechanism(path).getFitResults().isEmpty(), "Back stored something");
        press(dialog, IDialogConstants.NEXT_ID);
        driver.waitFor("the last page again", FIT_NANOS, () -> dialog.getCurrentPage() == results ? results : null);
        press(dialog, IDialogConstants.FINISH_ID);
        assertTrue(dialog.getShell() == null || dialog.getShell().isDisposed(), "Finish closes the wizard");
        List<FitResult> fits = MechanismLoader.readMechanism(path).getFitResults();
        assertEquals(1, fits.size(), "the stored fit in the file");
        FitResult fit = fits.get(0);
        assertEquals(List.of("viscous", "coulomb"), fit.getTermIds(), "the chosen terms");
        double stored = fit.getEstimates().stream().filter(e -> "b".equals(e.getParameter())).findFirst().orElseThrow()
                .getValue();
        assertEquals(expected.fit().parameter("b").orElseThrow().value(), stored, 0.0, "b as the services fitted it");
        assertEquals("fixed", fit.getSettings().stream().filter(s -> "inertia".equals(s.getKey())).findFirst()
                .orElseThrow().getValue(), "J0 held");
        driver.waitFor("the stored fit in the Friction view", () -> view.shown() != null
                && view.shown().id().equals(fit.getId()) ? view.shown() : null);
        driver.shot(driver.shell(), "fit-wizard-stored.png");

        // With the editor open, Finish adds the fit to its document as one command; Undo removes it.
        IEditorPart editor = IDE.openEditor(driver.page(), file, PendulineViews.MECHANISM_EDITOR);
        MechanismDocument document = driver.waitFor("the editor's document",
                () -> MechanismDocuments.of(file).orElse(null));
        WizardDialog again = open(driver, view);
        FitWizard inEditor = wizardOf(again);
        inEditor.setupPage().resamplesSpinner().setSelection(0);
        pick(inEditor.setupPage().termsChoice(), 1);
        press(again, IDialogConstants.NEXT_ID);
        driver.waitFor("the last page in the editor's case", FIT_NANOS,
                () -> again.getCurrentPage() == inEditor.resultsPage() ? again : null);
        press(again, IDialogConstants.FINISH_ID);
        assertEquals(2, document.mechanism().getFitResults().size(), "the fit is in the open document");
        assertTrue(document.isDirty(), "the document holds an unsaved change");
        assertEquals(1, MechanismLoader.readMechanism(path).getFitResults().size(), "the file is not written behind "
                + "the editor's back");
        assertEquals(FitWizard.STORE_LABEL, document.commandStack().getUndoCommand().getLabel(), "one command");
        driver.shot(driver.shell(), "fit-wizard-in-editor.png");
        driver.page().activate(editor);
        driver.flush();
        driver.window().getService(IHandlerService.class).executeCommand("org.eclipse.ui.edit.undo", null);
        assertEquals(1, document.mechanism().getFitResults().size(), "Undo removes the stored fit");
        assertFalse(document.isDirty(), "undone back to the saved state");
        driver.page().closeEditor(editor, false);
        driver.flush();
    }

    /**
     * Presses the Friction view's "Fit Friction…" button and returns the wizard's dialog.
     *
     * @param driver the driver
     * @param view   the Friction view
     * @return the open dialog
     */
    static WizardDialog open(WorkbenchDriver driver, FrictionPart view) throws InterruptedException {
        WizardDialog before = view.wizardDialog();
        assertTrue(view.fitButton().isEnabled(), "Fit Friction\u2026 is disabled");
        view.fitButton().notifyListeners(SWT.Selection, new Event());
        WizardDialog dialog = driver.waitFor("the Friction Fit wizard", () -> view.wizardDialog() != before
                && view.wizardDialog() != null && view.wizardDialog().getShell() != null ? view.wizardDialog() : null);
        assertEquals("Friction Fit", dialog.getShell().getText(), "the wizard's title");
        return dialog;
    }

    static FitWizard wizardOf(WizardDialog dialog) {
        return (FitWizard) dialog.getCurrentPage().getWizard();
    }

    /**
     * Presses one of the dialog's buttons as the user would.
     *
     * @param dialog the dialog
     * @param id     the button's id ({@link IDialogConstants})
     */
    static void press(WizardDialog dialog, int id) {
        Button b = button(dialog.getShell(), id);
        assertNotNull(b, "no button " + id + " in the wizard");
        assertTrue(b.isEnabled(), "button " + b.getText() + " is disabled");
        b.notifyListeners(SWT.Selection, new Event());
    }

    private static Button button(Composite parent, int id) {
        for (Control c : parent.getChildren()) {
            if (c instanceof Button b && Integer.valueOf(id).equals(b.getData())) {
                return b;
            }
            if (c instanceof Composite inner) {
                Button found = button(inner, id);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    /** The cancel button of the wizard's progress part (a tool item beside the progress bar). */
    private static ToolItem stopButton(Composite parent) {
        for (Control c : parent.getChildren()) {
            if (c instanceof ProgressMonitorPart part) {
                for (Control inner : part.getChildren()) {
                    if (inner instanceof ToolBar bar && bar.getItemCount() > 0) {
                        return bar.getItem(0);
                    }
                }
            }
            if (c instanceof Composite inner) {
                ToolItem found = stopButton(inner);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private static void pick(Combo combo, int index) {
        combo.select(index);
        combo.notifyListeners(SWT.Selection, new Event());
    }

    private static TableItem rowOf(Table table, String symbol) {
        for (TableItem item : table.getItems()) {
            if (item.getText(1).equals(symbol)) {
                return item;
            }
        }
        throw new AssertionError("no row " + symbol + " in the estimates table");
    }
}
