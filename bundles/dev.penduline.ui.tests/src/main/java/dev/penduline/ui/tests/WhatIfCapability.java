package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Scale;
import org.eclipse.swt.widgets.Spinner;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IViewReference;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.ide.IDE;

import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.Mechanism;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.services.MechanismForecast;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.present.Figures;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.ProjectFolders;
import dev.penduline.ui.internal.chart.ChartTools;
import dev.penduline.ui.internal.document.MechanismDocument;
import dev.penduline.ui.internal.document.MechanismDocuments;
import dev.penduline.ui.internal.whatif.WhatIfPart;

/**
 * The Swing Trial view on a copy of the sample hatch: it starts from the stored fit with its
 * bands, moving the viscous slider settles the swing sooner and shows the settle time the
 * forecast service gives for the same values; with no friction and a small release the first
 * swing's period is the compound pendulum's; Store as Hypothesis writes the file when no editor
 * has it, and is one undoable command on the editor's document when one has.
 */
final class WhatIfCapability implements Capability {

    private static final Pattern SECONDS = Pattern.compile("([0-9.e-]+) s.*");

    private WorkbenchDriver driver;
    private WhatIfPart view;

    @Override
    public void run(WorkbenchDriver d) throws Exception {
        driver = d;
        Path scratch = Files.createTempDirectory("penduline-whatif-test");
        Path folder = ChartExportCapability.copySample(scratch.resolve("inspection-hatch"));
        IProject project = ProjectFolders.open(folder, new NullProgressMonitor());
        IFile file = ProjectFolders.firstMechanismFile(project).orElseThrow();
        view = (WhatIfPart) d.part(PendulineViews.WHAT_IF).getObject();
        d.reveal(file);
        d.parts().showPart(PendulineViews.WHAT_IF, PartState.ACTIVATE);
        IViewReference ref = d.page().findViewReference(PendulineViews.WHAT_IF);
        d.page().setPartState(ref, IWorkbenchPage.STATE_MAXIMIZED);
        try {
            String first = settled("the sample's trial");
            assertTrue(view.fit() != null && view.fit().id().startsWith("fit-"), "starts from the stored fit");
            String band = (String) view.control("b")[2];
            assertEquals("fit " + Figures.measured(view.fit().friction().viscous(), view.fit().sigmas()[0]), band,
                    "the fit's band beside the viscous slider");
            for (Chart c : view.charts()) {
                assertTrue(c.getSeriesSet().getSeries().length > 0, "an empty chart: " + c.getTitle().getText());
                for (IAxis a : c.getAxisSet().getAxes()) {
                    assertTrue(a.getTitle().getText().matches(".*\\S \\([^()]+\\)"), "axis without unit: "
                            + a.getTitle().getText());
                }
                assertTrue(ChartTools.of(c) != null, "no chart tools on " + c.getTitle().getText());
            }
            d.shot(d.shell(), "whatif-start.png");
            double before = seconds(first);
            double b0 = view.friction().viscous();

            // The viscous slider moved by the user, half-way up its range (three times the fit's b).
            Scale scale = (Scale) view.control("b")[0];
            scale.setSelection(scale.getMaximum() / 2);
            scale.notifyListeners(SWT.Selection, new Event());
            String after = settled("the trial with more damping");
            double b1 = view.friction().viscous();
            assertTrue(b1 > 1.2 * b0, "the slider raised b: " + b0 + " -> " + b1);
            assertTrue(seconds(after) < before, "more damping settles sooner: " + first + " -> " + after);
            // the same figure from the service behind `penduline predict`, written by the same formatter
            SwingForecast expected = MechanismForecast.forecast(view.mechanism(), WhatIfPart.sourceOf(view.fit(),
                    view.friction()), view.request(), 0, MechanismForecast.DEFAULT_SEED).nominal();
            assertTrue(after.startsWith(Figures.significant(expected.settleTime()) + " s"), after + " vs the service's "
                    + expected.settleTime());
            d.shot(d.shell(), "whatif-more-damping.png");

            checkPeriod();
            store(file);
        } finally {
            d.page().setPartState(ref, IWorkbenchPage.STATE_RESTORED);
            d.flush();
        }
    }

    /**
     * No friction, released at 1°: the first swing's period is the compound pendulum's small-angle
     * period T0 = 2π·√(J0/(m·g·Lc)) (any dynamics text, e.g. Meriam and Kraige, Engineering
     * Mechanics: Dynamics, "compound pendulum"; from memory), longer by θ0²/16 ≈ 2e-5 at 1°.
     */
    private void checkPeriod() throws Exception {
        for (String term : new String[] {"b", "Tc", "Ts", "c"}) {
            Spinner s = (Spinner) view.control(term)[1];
            s.setSelection(0);
            s.notifyListeners(SWT.Modify, new Event());
        }
        Spinner angle = (Spinner) view.control("angle")[1];
        angle.setSelection((int) Math.round(Math.pow(10, angle.getDigits())));
        angle.notifyListeners(SWT.Modify, new Event());
        assertEquals(FrictionTorques.none(), view.friction());
        driver.waitFor("the frictionless trial", 120_000_000_000L, () -> view.upToDate() ? view : null);
        MechanismProperties p = view.mechanism().properties();
        double j0 = view.fit().fittedInertia();
        double t0 = 2 * Math.PI * Math.sqrt(j0 / (p.mass() * p.gravity() * Math.cos(p.axisTilt()) * p.centroidDistance()));
        double shown = seconds(view.figure(WhatIfPart.PERIOD));
        // four significant digits shown: within half a unit of the last one, plus the 2e-5 of the amplitude
        assertEquals(t0, shown, 6e-4 * t0, "the first swing's period against 2π·√(J0/(m·g·Lc))");
        driver.shot(driver.shell(), "whatif-no-friction.png");
    }

    private void store(IFile file) throws Exception {
        Scale scale = (Scale) view.control("b")[0];
        scale.setSelection(scale.getMaximum() / 4);
        scale.notifyListeners(SWT.Selection, new Event());
        settled("the trial to store");
        double b = view.friction().viscous();
        Path path = file.getLocation().toPath();
        int stored = MechanismLoader.readMechanism(path).getFrictionHypotheses().size();
        view.storeButton().notifyListeners(SWT.Selection, new Event());
        driver.flush();
        Mechanism saved = MechanismLoader.readMechanism(path);
        assertEquals(stored + 1, saved.getFrictionHypotheses().size(), "one hypothesis more in the file: " + view.status());
        FrictionHypothesis h = saved.getFrictionHypotheses().get(stored);
        assertEquals("swing trial", h.getName());
        assertEquals(1, h.getTerms().size(), "only the non-zero term: " + h.getTerms());
        assertEquals("viscous", h.getTerms().get(0).getKind().getLiteral());
        assertEquals(b, h.getTerms().get(0).getValue(), 0.0, "the value chosen");
        driver.shot(driver.shell(), "whatif-stored.png");

        // With the editor open: the same button is one command on its document, and Edit › Undo takes it back.
        IEditorPart editor = IDE.openEditor(driver.page(), file, PendulineViews.MECHANISM_EDITOR);
        try {
            driver.flush();
            MechanismDocument document = MechanismDocuments.of(file).orElseThrow(() -> new AssertionError("no document"));
            int open = document.mechanism().getFrictionHypotheses().size();
            assertEquals(stored + 1, open, "the editor read the stored hypothesis");
            driver.parts().showPart(PendulineViews.WHAT_IF, PartState.ACTIVATE);
            driver.flush();
            view.storeButton().notifyListeners(SWT.Selection, new Event());
            driver.flush();
            assertEquals(open + 1, document.mechanism().getFrictionHypotheses().size(), "added to the open document: "
                    + view.status());
            assertEquals("swing trial-2", document.mechanism().getFrictionHypotheses().get(open).getName());
            assertTrue(document.isDirty(), "the editor has an unsaved change");
            assertEquals(stored + 1, MechanismLoader.readMechanism(path).getFrictionHypotheses().size(), "file untouched");
            driver.shot(driver.shell(), "whatif-stored-in-editor.png");
            driver.page().activate(editor);
            driver.flush();
            driver.window().getService(IHandlerService.class).executeCommand("org.eclipse.ui.edit.undo", null);
            driver.flush();
            assertEquals(open, document.mechanism().getFrictionHypotheses().size(), "undo took the hypothesis back");
            assertFalse(document.isDirty(), "undone to the saved state");
        } finally {
            driver.page().closeEditor(editor, false);
            driver.flush();
        }
    }

    private String settled(String what) throws InterruptedException {
        return driver.waitFor(what, () -> view.upToDate() && SECONDS.matcher(view.figure(WhatIfPart.SETTLE)).matches()
                ? view.figure(WhatIfPart.SETTLE) : null);
    }

    private static double seconds(String text) {
        Matcher m = SECONDS.matcher(text);
        assertTrue(m.matches(), text);
        return Double.parseDouble(m.group(1));
    }
}
