package dev.penduline.ui.internal.chart;
import java.nio.file.Path;
import java.util.function.Function;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.ILog;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Chart;

import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.services.InputException;
import dev.penduline.ui.internal.FollowingPart;
import dev.penduline.ui.internal.MechanismSelection;

/**
 * The Swing Chart view: for the mechanism selected in Project Files, lists its test sessions;
 * the chosen session's record is read with the mapping stored in the file and plotted, angle
 * against time, with the turning points and the release the analysis found and a short summary
 * below. Without a session it plots the free swing the inertia predicts. Reading, analysing and
 * simulating run in jobs; the widgets are touched on the UI thread only.
 */
public final class SwingChartPart extends FollowingPart {

    private Combo sessions;
    private SwingChart chart;
    private Text summary;
    private ChartSubject subject;
    private SwingChartContent content;
    private int keepSession = -1;

    /** A copy of an editor's live model to chart, and the session the user had chosen. */
    private record Live(Mechanism mechanism, Path file, int session) {
    }

    /** What one reading opened (null when it failed) and what it drew from it. */
    private record Loaded(ChartSubject opened, SwingChartContent content) {
    }

    @Override
    protected void build(Composite parent) {
        GridLayoutFactory.swtDefaults().numColumns(2).margins(8, 6).applyTo(parent);
        Composite top = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).applyTo(top);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).applyTo(top);
        new Label(top, SWT.NONE).setText("Test session:");
        sessions = new Combo(top, SWT.READ_ONLY | SWT.DROP_DOWN);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(sessions);
        sessions.setEnabled(false);
        sessions.addListener(SWT.Selection, e -> {
            if (subject != null && sessions.getSelectionIndex() >= 0 && !subject.sessions().isEmpty()) {
                int index = sessions.getSelectionIndex();
                load("Reading session " + sessions.getText(), subject.file().getFileName().toString(),
                        s -> s.session(index), subject);
            }
        });
        chart = new SwingChart(parent);
        GridDataFactory.fillDefaults().grab(true, true).hint(300, 150).applyTo(chart.control());
        // Beside the chart rather than below it: the view is wide and short in the perspective.
        summary = new Text(parent, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL);
        summary.setBackground(parent.getBackground());
        summary.setText("Select a mechanism file in Project Files to see its swing records.");
        GridDataFactory.fillDefaults().grab(false, true).hint(330, SWT.DEFAULT).applyTo(summary);
    }

    /**
     * Shows a mechanism file or parts list: its first session, or the predicted swing. A session
     * added to the shown file (by the command line, say) shows once the workspace sees it.
     *
     * @param file the file
     */
    @Override
    public void show(IFile file) {
        var open = openDocument(file);
        if (open.isPresent()) {
            // the editor's model, copied here on the UI thread; the job computes from the copy
            int chosen = file.equals(shownFile()) ? sessions.getSelectionIndex() : -1;
            shown(file);
            forget();
            keepSession = chosen;
            load("Simulating the swing of " + file.getName(), file.getName(), null,
                    new Live(EcoreUtil.copy(open.get().mechanism()), MechanismSelection.pathOf(file), chosen));
            return;
        }
        keepSession = -1;
        if (showsUnchanged(file)) {
            return;
        }
        shown(file);
        load("Reading the swing records of " + file.getName(), file.getName(), null,
                MechanismSelection.pathOf(file));
    }

    /**
     * Runs one reading in a job and shows its result if no newer one was asked for meanwhile.
     *
     * @param what     the job's name
     * @param fileName the file, for messages
     * @param step     what to do with an open subject (null: open the file and show its first content)
     * @param input    the subject, or the path to open
     */
    private void load(String what, String fileName, Function<ChartSubject, SwingChartContent> step, Object input) {
        summary.setText(what + " ...");
        read(what, false, () -> {
            try {
                ChartSubject opened = input instanceof ChartSubject s ? s : input instanceof Live l
                        ? ChartSubject.of(l.mechanism(), l.file()) : ChartSubject.open((Path) input);
                int keep = input instanceof Live l ? l.session() : -1;
                return new Loaded(opened, step != null ? step.apply(opened) : keep > 0 && keep < opened.sessions().size()
                        ? opened.session(keep) : opened.first());
            } catch (InputException e) {
                return new Loaded(null, SwingChartContent.failed(fileName, e.getMessage()));
            } catch (RuntimeException e) {
                ILog.of(SwingChartPart.class).error(what + " failed", e);
                return new Loaded(null, SwingChartContent.failed(fileName, fileName + ": could not be shown ("
                        + e.getMessage() + "); the error log has the details"));
            }
        }, loaded -> apply(loaded.opened(), loaded.content(), step == null));
    }

    private void apply(ChartSubject opened, SwingChartContent result, boolean fresh) {
        if (fresh) {
            subject = opened;
            fillSessions(opened);
            if (opened != null && keepSession > 0 && keepSession < opened.sessions().size()) {
                sessions.select(keepSession);
            }
        }
        content = result;
        chart.draw(result);
        StringBuilder text = new StringBuilder();
        result.error().ifPresent(e -> text.append(e));
        result.summary().forEach(line -> text.append(text.isEmpty() ? "" : "\n\n").append(line));
        if (!result.warnings().isEmpty()) {
            text.append("\n\nWarnings:\n- ").append(String.join("\n- ", result.warnings()));
        }
        summary.setText(text.toString());
        summary.setForeground(result.error().isPresent() ? summary.getDisplay().getSystemColor(SWT.COLOR_DARK_RED)
                : null);
        summary.getParent().layout(true, true);
    }

    private void fillSessions(ChartSubject opened) {
        sessions.removeAll();
        if (opened == null || opened.sessions().isEmpty()) {
            sessions.add(opened == null ? "(none)" : "(no test session: predicted swing)");
            sessions.select(0);
            sessions.setEnabled(false);
            return;
        }
        for (TestSession s : opened.sessions()) {
            sessions.add(s.getName() + "  (" + s.getRecordPath() + ")");
        }
        sessions.select(0);
        sessions.setEnabled(true);
    }

    /**
     * Chooses a session by its position, as the user would in the list.
     *
     * @param index the session's position in the mechanism file
     */
    public void choose(int index) {
        sessions.select(index);
        sessions.notifyListeners(SWT.Selection, null);
    }

    /**
     * What the view draws now, for tests.
     *
     * @return the content last drawn, or null before the first file is shown
     */
    public SwingChartContent content() {
        return content;
    }

    /**
     * The chart widget, for tests.
     *
     * @return the SWTChart chart
     */
    public Chart chart() {
        return chart.control();
    }
}
