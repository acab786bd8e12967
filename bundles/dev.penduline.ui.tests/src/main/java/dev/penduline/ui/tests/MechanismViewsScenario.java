package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Optional;
import java.util.function.Supplier;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.ISeries;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;

import dev.penduline.model.Mechanism;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.swing.LossVerdict;
import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.services.DemoRecords;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.SwingSessionAnalysis;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.ProjectFilesPart;
import dev.penduline.ui.internal.chart.SwingChartContent;
import dev.penduline.ui.internal.chart.SwingChartPart;
import dev.penduline.ui.internal.mechanism.InertiaTotal;
import dev.penduline.ui.internal.mechanism.MechanismPart;
import dev.penduline.ui.internal.mechanism.MechanismSheet;
import dev.penduline.ui.internal.wizard.NewMechanismProjectWizard;

/**
 * What an engineer does first, run inside the live workbench: creates a mechanism project with
 * the wizard from an invented parts list, reads the Mechanism view, looks at the predicted swing,
 * adds an invented swing record as a session and reads the Swing Chart, then selects a broken
 * file. The views must show what the services compute; the services' numbers are checked
 * against handbooks in their own tests. Every wait is bounded.
 */
final class MechanismViewsScenario {

    /** The longest wait for a job's result to reach a view. */
    private static final long WAIT_NANOS = 20_000_000_000L;


    private final IWorkbenchWindow window;
    private final Shell shell;
    private final EPartService parts;
    private final Screenshots shots;
    private final WorkbenchDriver driver;

    MechanismViewsScenario(IWorkbenchWindow window, Screenshots shots) {
        this.window = window;
        this.shell = window.getShell();
        this.parts = window.getService(EPartService.class);
        this.shots = shots;
        this.driver = new WorkbenchDriver(window, shots);
    }

    void run() throws Exception {
        Path scratch = Files.createTempDirectory("penduline-ui-test");
        Path csv = Files.writeString(scratch.resolve("test-arm-parts.csv"), TestMechanisms.ROD_AND_DISC, StandardCharsets.UTF_8);
        IFile mechanismFile = createProjectWithWizard(csv);
        Path path = MechanismSelection.pathOf(mechanismFile);

        MechanismPart mechanism = (MechanismPart) part(PendulineViews.MECHANISM).getObject();
        MechanismSheet sheet = waitFor("the Mechanism view to show J0", () -> {
            MechanismSheet s = mechanism.sheet();
            return s != null && s.shown(InertiaTotal.PIVOT_INERTIA).isPresent() ? s : null;
        });
        MechanismSource computed = new MechanismLoader().load(path);
        String shownJ0 = sheet.shown(InertiaTotal.PIVOT_INERTIA).orElseThrow();
        // The view must show the services' J0 to its four significant digits.
        assertEquals(computed.properties().pivotInertia(), Double.parseDouble(shownJ0), 5e-4, "J0 shown");
        // Hand check of the same mechanism (Meriam & Kraige, Dynamics, Table D/4 and the
        // parallel-axis theorem): rod m L²/3 = 0.426667, disc m r²/2 + m d² = 2.445, J0 = 2.871667 kg·m²,
        // 2.872 to four significant digits.
        assertEquals("2.872", shownJ0, "J0 against the handbook");
        assertEquals("Test arm (invented)", sheet.title());
        assertEquals(2, sheet.parts().size(), "parts shown");
        assertEquals("arm", sheet.parts().get(0).name(), "parts keep the file's order");
        assertTrue(sheet.error().isEmpty(), () -> sheet.error().orElse(""));

        SwingChartPart chart = (SwingChartPart) part(PendulineViews.SWING_CHART).getObject();
        SwingChartContent predicted = waitFor("the predicted swing", () -> {
            SwingChartContent c = chart.content();
            return c != null && c.predicted() && c.curve().size() > 0 ? c : null;
        });
        assertTrue(predicted.title().contains("no friction"), predicted.title());
        shots.take(shell, "mechanism.png");

        addInventedSession(mechanismFile, computed, scratch);
        SwingChartContent recorded = waitFor("the recorded session in the Swing Chart", () -> {
            SwingChartContent c = chart.content();
            return c != null && !c.predicted() && c.curve().size() > 0 ? c : null;
        });
        checkChart(chart, recorded, path);
        shots.take(shell, "swing-chart.png");

        showBrokenFile(mechanismFile, mechanism);
    }

    private IFile createProjectWithWizard(Path csv) throws Exception {
        NewMechanismProjectWizard wizard = new NewMechanismProjectWizard();
        wizard.init(PlatformUI.getWorkbench(), StructuredSelection.EMPTY);
        WizardDialog dialog = new WizardDialog(shell, wizard);
        dialog.setBlockOnOpen(false);
        dialog.open();
        try {
            wizard.fill("test-arm", "Test arm (invented)", csv);
            flush();
            assertTrue(wizard.canFinish(), "the wizard should accept a new name and an existing parts list");
            shots.take(dialog.getShell(), "new-mechanism-project.png");
            assertTrue(wizard.performFinish(), "the wizard did not finish");
        } finally {
            dialog.close();
        }
        IFile file = wizard.created();
        assertNotNull(file, "the wizard created no mechanism file");
        assertTrue(file.exists(), file + " is not in the workspace");
        assertEquals("test-arm-invented.penduline", file.getName());
        return file;
    }

    private void addInventedSession(IFile mechanismFile, MechanismSource mechanism, Path scratch) throws Exception {
        // 25 s at 1 kHz (25 001 samples, more than the chart draws), released at 20°.
        DemoRecords.Settings settings = new DemoRecords.Settings(Unit.DEGREE.toSi(20), Unit.DEGREE.toSi(1.5),
                Unit.DEGREE.toSi(0.02), 0, 1.0, 25, 1000, 7);
        Path record = scratch.resolve("invented-release-20deg.csv");
        DemoRecords.write(mechanism, new FrictionTorques(0.1, 0.1, 0.15, 0), settings, record);
        SessionRecords.addSession(MechanismSelection.pathOf(mechanismFile), record, SwingImportOptions.defaults(),
                "Invented release at 20°", Double.NaN, "INVENTED record made by the workbench test");
        mechanismFile.getProject().refreshLocal(IResource.DEPTH_INFINITE, null);
    }

    private void checkChart(SwingChartPart chart, SwingChartContent shown, Path path) throws Exception {
        Mechanism m = MechanismLoader.readMechanism(path);
        SessionRecords.SessionRecord read = SessionRecords.readSession(path, m.getSessions().get(0));
        double[] t = read.record().times();
        double[] deg = Arrays.stream(read.record().angles()).map(Unit.DEGREE::fromSi).toArray();
        ISeries<?> curve = chart.chart().getSeriesSet().getSeries("angle");
        assertNotNull(curve, "no angle series in the chart");
        double[] x = curve.getXSeries();
        double[] y = curve.getYSeries();
        assertEquals(t.length, shown.curvePoints(), "samples of the record");
        assertTrue(x.length <= SwingChartContent.DRAWN_POINTS && x.length > 1000, "points drawn: " + x.length);
        assertEquals(t[0], x[0], "first sample");
        assertEquals(t[t.length - 1], x[x.length - 1], "last sample");
        assertEquals(Arrays.stream(deg).max().orElseThrow(), Arrays.stream(y).max().orElseThrow(), "highest angle");
        assertEquals(Arrays.stream(deg).min().orElseThrow(), Arrays.stream(y).min().orElseThrow(), "lowest angle");
        SwingAnalysis analysis = SwingSessionAnalysis.analyse(read.record(),
                Optional.of(new MechanismLoader().load(path)));
        ISeries<?> turns = chart.chart().getSeriesSet().getSeries("turning points");
        assertNotNull(turns, "no turning-point series in the chart");
        assertEquals(analysis.turningPoints().size(), turns.getXSeries().length, "turning points drawn");
        assertEquals(analysis.turningPoints().get(0).time(), turns.getXSeries()[0], "first turning point");
        assertEquals(analysis.release().time(), shown.releaseTime(), "release time");
        assertNotNull(chart.chart().getSeriesSet().getSeries("release"), "no release marker");
        // the decrement reading is a first look, not a verdict: that word is the fit's, in the Friction view
        assertTrue(shown.summary().get(0).startsWith(LossVerdict.HEADING + ": "), shown.summary().get(0));
        assertTrue(shown.summary().stream().noneMatch(line -> line.contains("Verdict")), shown.summary().toString());
    }

    private void showBrokenFile(IFile good, MechanismPart mechanism) throws Exception {
        IFile broken = good.getProject().getFile("broken.penduline");
        broken.create(new ByteArrayInputStream(
                "<?xml version=\"1.0\"?>\n<penduline:Mechanism>\n  <name>half a file\n".getBytes(StandardCharsets.UTF_8)),
                true, null);
        reveal(broken);
        MechanismSheet sheet = waitFor("the Mechanism view to report the broken file", () -> {
            MechanismSheet s = mechanism.sheet();
            return s != null && s.error().isPresent() && s.source().endsWith("broken.penduline") ? s : null;
        });
        String message = sheet.error().orElseThrow();
        assertTrue(message.matches("(?s).*broken\\.penduline:\\d+(:\\d+)?: .*"), "no file:line in " + message);
        assertFalse(message.contains("Exception") || message.contains("\tat "), "a stack trace leaked: " + message);
        shots.take(shell, "mechanism-error.png");
    }

    private void reveal(IFile file) {
        MPart p = parts.showPart(PendulineViews.PROJECT_FILES, PartState.ACTIVATE);
        ((ProjectFilesPart) p.getObject()).reveal(file);
    }

    private MPart part(String id) {
        MPart p = parts.findPart(id);
        assertNotNull(p, "no part " + id);
        assertNotNull(p.getObject(), "part " + id + " was never created");
        return p;
    }

    private <T> T waitFor(String what, Supplier<T> probe) throws InterruptedException {
        return driver.waitFor(what, probe);
    }

    private void flush() {
        driver.flush();
    }
}
