package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.ui.IWorkbenchWindow;

import dev.penduline.model.Estimate;
import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.services.DemoRecords;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.StoredFitText;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.ProjectFilesPart;
import dev.penduline.ui.internal.friction.FitWizard;
import dev.penduline.ui.internal.friction.FrictionPart;
import dev.penduline.ui.internal.friction.FrictionSheet;
import dev.penduline.ui.internal.wizard.MechanismProjectCreation;

/**
 * The Friction view in the live workbench: a new mechanism project without sessions (the Friction
 * Fit wizard must show the services' message, not a stack trace), then two short invented release
 * records, fitted through the wizard with its defaults (those of {@code penduline fit}) and
 * Finish, and the stored result read back. The fit engine's accuracy is
 * checked against known truths in the physics and services tests; here the check is that the
 * view shows exactly what the service stored in the file. Every wait is bounded.
 */
final class FrictionViewScenario {

    /** Bound on waits for reading a file (the view's own short job). */
    private static final long READ_NANOS = 20_000_000_000L;
    /** Bound on the fit of two 12 s records (several candidate term sets and their bootstraps). */
    private static final long FIT_NANOS = 120_000_000_000L;


    private final Shell shell;
    private final EPartService parts;
    private final Screenshots shots;
    private final WorkbenchDriver driver;

    FrictionViewScenario(IWorkbenchWindow window, Screenshots shots) {
        this.shell = window.getShell();
        this.parts = window.getService(EPartService.class);
        this.shots = shots;
        this.driver = new WorkbenchDriver(window, shots);
    }

    void run() throws Exception {
        Path scratch = Files.createTempDirectory("penduline-friction-test");
        Path csv = Files.writeString(scratch.resolve("fit-arm-parts.csv"), TestMechanisms.ROD_AND_DISC, StandardCharsets.UTF_8);
        IFile file = MechanismProjectCreation.create("fit-arm", "Fit arm (invented)", Optional.of(csv), null)
                .mechanismFile();
        Path path = MechanismSelection.pathOf(file);
        FrictionPart view = (FrictionPart) parts.showPart(PendulineViews.FRICTION, PartState.VISIBLE).getObject();
        assertNotNull(view, "the Friction view was not created");
        reveal(file);
        waitFor("the Friction view to read " + file.getName(), READ_NANOS, () -> {
            FrictionSheet s = view.sheet();
            return s != null && s.source().equals(path.toString()) ? s : null;
        });
        assertTrue(view.shown() == null, "a new file has no stored fit");

        // Without sessions the wizard cannot run; it must say why, in the services' words.
        WizardDialog empty = FitWizardCapability.open(driver, view);
        String refusal = String.valueOf(FitWizardCapability.wizardOf(empty).setupPage().getErrorMessage());
        assertTrue(refusal.contains("has no test sessions"), refusal);
        assertFalse(refusal.contains("Exception") || refusal.contains("\tat "), "a stack trace leaked: " + refusal);
        FitWizardCapability.press(empty, IDialogConstants.CANCEL_ID);
        assertTrue(MechanismLoader.readMechanism(path).getFitResults().isEmpty(), "a refused fit stored something");

        addInventedSessions(path, new MechanismLoader().load(path), scratch);
        file.getProject().refreshLocal(IResource.DEPTH_INFINITE, null);
        waitFor("the view to see the two sessions", READ_NANOS,
                () -> view.sheet() != null && view.sheet().sessions() == 2 ? view.sheet() : null);
        shots.take(shell, "friction-empty.png");

        fitWithDefaults(view);
        StoredFitText shown = waitFor("the fitted result in the Friction view", READ_NANOS,
                () -> view.shown() != null ? view.shown() : null);
        assertTrue(view.fitButton().isEnabled(), "the button must be enabled again after the fit");

        Mechanism stored = MechanismLoader.readMechanism(path);
        assertEquals(1, stored.getFitResults().size(), "fit results in the file; message: " + view.message());
        FitResult result = stored.getFitResults().get(0);
        assertEquals(result.getId(), shown.id(), "the view shows the stored result");
        checkEstimate(view.estimatesTable(), result, "b");
        checkEstimate(view.estimatesTable(), result, "Tc");
        assertEquals(2, shown.sessions().size(), "sessions shown");
        assertEquals(result.getComparisons().size(), shown.comparisons().size(), "term sets shown");
        assertEquals(1, shown.comparisons().stream().filter(StoredFitText.ComparisonRow::selected).count(),
                "exactly one term set is marked as kept");
        assertTrue(shown.verdict().startsWith("Verdict: "), shown.verdict());
        shots.take(shell, "friction.png");

        // A second fit is stored beside the first; the newest is shown, the older one can be picked.
        fitWithDefaults(view);
        waitFor("the second fit in the Friction view", READ_NANOS,
                () -> view.sheet().fits().size() == 2 ? view.sheet() : null);
        List<FitResult> results = MechanismLoader.readMechanism(path).getFitResults();
        assertEquals(2, results.size(), "fit results after the second fit; message: " + view.message());
        assertEquals(results.get(1).getId(), view.shown().id(), "the newest fit is shown");
        view.pick(1);
        assertEquals(results.get(0).getId(), view.shown().id(), "the older fit can be picked");
        checkEstimate(view.estimatesTable(), results.get(0), "b");
    }

    static void addInventedSessions(Path mechanismFile, MechanismSource mechanism, Path scratch) throws Exception {
        // INVENTED truth: viscous 0.01 N·m·s/rad and Coulomb 0.04 N·m; 12 s at 200 Hz in degrees
        // with 0.02° noise, released at 12° and at 35° (two amplitudes separate viscous from dry).
        FrictionTorques truth = new FrictionTorques(0.01, 0.04, 0, 0);
        int seed = 11;
        for (double degrees : List.of(12.0, 35.0)) {
            DemoRecords.Settings settings = new DemoRecords.Settings(Unit.DEGREE.toSi(degrees),
                    Unit.DEGREE.toSi(0.8), Unit.DEGREE.toSi(0.02), 0, 0.5, 12, 200, seed++);
            Path record = scratch.resolve("invented-release-" + (int) degrees + "deg.csv");
            DemoRecords.write(mechanism, truth, settings, record);
            SessionRecords.addSession(mechanismFile, record, SwingImportOptions.defaults(),
                    "Invented release at " + (int) degrees + "°", Double.NaN,
                    "INVENTED record made by the workbench test");
        }
    }

    /** The value and σ the user reads in the table must be the stored ones, to the digits shown. */
    private static void checkEstimate(Table table, FitResult result, String symbol) {
        Estimate e = result.getEstimates().stream().filter(x -> symbol.equals(x.getParameter())).findFirst()
                .orElseThrow(() -> new AssertionError("no stored estimate " + symbol + " in " + result.getTermIds()));
        TableItem row = null;
        for (TableItem item : table.getItems()) {
            if (item.getText(0).endsWith("  " + symbol)) {
                row = item;
            }
        }
        assertNotNull(row, "no row " + symbol + " in the estimates table");
        // the σ to quote by the fit's own rule (the resampling σ only when clearly larger)
        double sigma = new ParameterEstimate(symbol, "", e.getValue(),
                e.isSetStandardError() ? e.getStandardError() : Double.NaN,
                e.isSetResamplingError() ? e.getResamplingError() : Double.NaN, true, false).sigma();
        // Two significant digits of that standard error.
        BigDecimal sigmaShown = new BigDecimal(row.getText(2));
        assertEquals(sigma, sigmaShown.doubleValue(), 0.05 * sigma, symbol + " σ shown");
        // The value rounded to the decimal place of that standard error (GUM §7.2.6).
        BigDecimal valueShown = new BigDecimal(row.getText(1));
        assertEquals(sigmaShown.ulp(), valueShown.ulp(), symbol + " shown to the place of its σ: " + row.getText(1));
        assertEquals(e.getValue(), valueShown.doubleValue(), 0.5 * sigmaShown.ulp().doubleValue() * (1 + 1e-9),
                symbol + " shown");
    }

    /** The wizard with its defaults (those of 'penduline fit'): Next runs the fit, Finish stores it. */
    private void fitWithDefaults(FrictionPart view) throws InterruptedException {
        WizardDialog dialog = FitWizardCapability.open(driver, view);
        FitWizard wizard = FitWizardCapability.wizardOf(dialog);
        FitWizardCapability.press(dialog, IDialogConstants.NEXT_ID);
        waitFor("the fit's last page", FIT_NANOS, () -> dialog.getCurrentPage() == wizard.resultsPage() ? dialog : null);
        FitWizardCapability.press(dialog, IDialogConstants.FINISH_ID);
        assertTrue(dialog.getShell() == null, "Finish closes the wizard; message: " + wizard.resultsPage().getErrorMessage());
    }

    private void reveal(IFile file) {
        MPart p = parts.showPart(PendulineViews.PROJECT_FILES, PartState.ACTIVATE);
        ((ProjectFilesPart) p.getObject()).reveal(file);
    }

    private <T> T waitFor(String what, long nanos, Supplier<T> probe) throws InterruptedException {
        return driver.waitFor(what, nanos, probe);
    }

    private void flush() {
        driver.flush();
    }
}
