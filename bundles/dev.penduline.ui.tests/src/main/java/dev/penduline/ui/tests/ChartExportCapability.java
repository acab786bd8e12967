package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ISeries;
import org.eclipse.swtchart.Range;
import org.eclipse.ui.IViewReference;
import org.eclipse.ui.IWorkbenchPage;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.ProjectFolders;
import dev.penduline.ui.internal.chart.ChartTools;
import dev.penduline.ui.internal.chart.SwingChartContent;
import dev.penduline.ui.internal.chart.SwingChartPart;

/**
 * The chart tools on the Swing Chart of the sample hatch: the axis titles name their units, the
 * mouse wheel zooms about the cursor, a drag pans, hovering shows the sample under the cursor with
 * units, a double click and Show All show everything again, and the context menu's exports write
 * an SVG drawn from the series (parsed back: one polyline a series, axis titles, curve extremes
 * where its own axis puts them) and a PNG of the chart's size.
 */
final class ChartExportCapability implements Capability {

    /** "quantity (unit)": how every axis title names its unit. */
    private static final Pattern WITH_UNIT = Pattern.compile(".*\\S \\([^()]+\\)");
    private static final Pattern READOUT = Pattern.compile(".*: time (-?[0-9.]+) s, angle (-?[0-9.]+) °");

    @Override
    public void run(WorkbenchDriver driver) throws Exception {
        Path scratch = Files.createTempDirectory("penduline-chart-test");
        Path folder = copySample(scratch.resolve("inspection-hatch"));
        IProject project = ProjectFolders.open(folder, new NullProgressMonitor());
        IFile file = ProjectFolders.firstMechanismFile(project).orElseThrow();
        SwingChartPart view = (SwingChartPart) driver.part(PendulineViews.SWING_CHART).getObject();
        driver.reveal(file);
        driver.parts().showPart(PendulineViews.SWING_CHART, PartState.ACTIVATE);
        SwingChartContent content = driver.waitFor("the hatch's first session in the Swing Chart", () -> {
            SwingChartContent c = view.content();
            return c != null && !c.predicted() && c.curve().size() > 0 && c.title().startsWith("Inspection hatch")
                    ? c : null;
        });
        // Maximised, as a user looking closely at a record would have it.
        IViewReference ref = driver.page().findViewReference(PendulineViews.SWING_CHART);
        driver.page().setPartState(ref, IWorkbenchPage.STATE_MAXIMIZED);
        driver.flush();
        try {
            drive(driver, scratch, view, content);
        } finally {
            driver.page().setPartState(ref, IWorkbenchPage.STATE_RESTORED);
            driver.flush();
        }
    }

    private static void drive(WorkbenchDriver driver, Path scratch, SwingChartPart view, SwingChartContent content)
            throws Exception {
        Chart chart = view.chart();
        ChartTools tools = ChartTools.of(chart);
        assertNotNull(tools, "the Swing Chart has no chart tools");
        for (IAxis axis : chart.getAxisSet().getAxes()) {
            String title = axis.getTitle().getText();
            assertTrue(WITH_UNIT.matcher(title).matches(), "axis title without a unit: " + title);
        }
        assertEquals("time (s)", chart.getAxisSet().getXAxis(0).getTitle().getText());
        assertEquals("angle (°)", chart.getAxisSet().getYAxis(0).getTitle().getText());
        driver.shot(driver.shell(), "chart-tools-start.png");

        Control plot = chart.getPlotArea().getControl();
        driver.flush();
        Point size = plot.getSize();
        assertTrue(size.x > 100 && size.y > 50, "the plot is too small to drive: " + size);
        IAxis x = chart.getAxisSet().getXAxis(0);
        Range all = new Range(x.getRange());
        int cx = size.x * 3 / 10;
        int cy = size.y / 2;

        // One notch of the wheel forwards: the time axis shows less, and the instant under the cursor stays put.
        double underCursor = x.getDataCoordinate(cx);
        plot.notifyListeners(SWT.MouseVerticalWheel, mouse(cx, cy, 0, 1, 0));
        driver.flush();
        Range zoomed = new Range(x.getRange());
        double span = all.upper - all.lower;
        assertTrue(zoomed.upper - zoomed.lower < 0.9 * span, "the wheel did not zoom in: " + all + " -> " + zoomed);
        assertEquals(underCursor, x.getDataCoordinate(cx), 2 * span / size.x, "zoom is about the cursor");
        assertTrue(zoomed.lower > all.lower && zoomed.upper < all.upper, "zoomed range " + zoomed + " inside " + all);
        driver.shot(driver.shell(), "chart-tools-zoomed.png");

        // A drag 100 px to the right shows earlier times, by 100 px worth of the zoomed range.
        double zoomedSpan = zoomed.upper - zoomed.lower;
        plot.notifyListeners(SWT.MouseDown, mouse(cx, cy, 1, 1, 0));
        plot.notifyListeners(SWT.MouseMove, mouse(cx + 50, cy, 0, 0, SWT.BUTTON1));
        plot.notifyListeners(SWT.MouseMove, mouse(cx + 100, cy, 0, 0, SWT.BUTTON1));
        plot.notifyListeners(SWT.MouseUp, mouse(cx + 100, cy, 1, 1, SWT.BUTTON1));
        driver.flush();
        Range panned = new Range(x.getRange());
        // the plot's width now: maximising the view beside the editor area may still have been laying out
        double shift = 100.0 * zoomedSpan / plot.getSize().x;
        assertEquals(zoomed.lower - shift, panned.lower, 1e-9 * span, "pan moved the range's lower end");
        assertEquals(zoomedSpan, panned.upper - panned.lower, 1e-9 * span, "pan keeps the range's width");

        // With Ctrl the wheel zooms the angle axis instead, about the cursor too.
        IAxis y = chart.getAxisSet().getYAxis(0);
        Range yBefore = new Range(y.getRange());
        double angleUnderCursor = y.getDataCoordinate(cy);
        plot.notifyListeners(SWT.MouseVerticalWheel, mouse(cx, cy, 0, 1, SWT.MOD1));
        double ySpan = yBefore.upper - yBefore.lower;
        assertTrue(y.getRange().upper - y.getRange().lower < 0.9 * ySpan, "Ctrl+wheel did not zoom the angle axis");
        assertEquals(angleUnderCursor, y.getDataCoordinate(cy), 2 * ySpan / size.y, "Ctrl+wheel zooms about the cursor");
        assertEquals(panned.lower, x.getRange().lower, 1e-12 * span, "Ctrl+wheel leaves the time axis");

        checkHover(driver, chart, tools, plot);

        // A double click shows everything again.
        plot.notifyListeners(SWT.MouseDoubleClick, mouse(cx, cy, 1, 2, 0));
        driver.flush();
        assertShowsAll(chart, "after a double click");

        ChartTools.PathChooser before = ChartTools.choosePathsWith(null);
        List<String> suggested = new ArrayList<>();
        try {
            ChartTools.choosePathsWith((shell, format, name) -> {
                suggested.add(name);
                return scratch.resolve("exported." + format).toString();
            });
            // Zoomed again, Show All from the context menu resets too.
            plot.notifyListeners(SWT.MouseVerticalWheel, mouse(cx, cy, 0, 1, 0));
            assertTrue(x.getRange().upper - x.getRange().lower < span, "zoomed again");
            Menu menu = plot.getMenu();
            assertNotNull(menu, "the plot has no context menu");
            choose(menu, ChartTools.SHOW_ALL);
            assertShowsAll(chart, "after Show All");
            shotOfMenu(driver, plot, menu);

            choose(menu, ChartTools.EXPORT_SVG);
            Path svg = scratch.resolve("exported.svg");
            assertTrue(Files.exists(svg), "no SVG written");
            checkSvg(svg, chart, content);
            choose(menu, ChartTools.EXPORT_PNG);
            Path png = scratch.resolve("exported.png");
            assertTrue(Files.exists(png), "no PNG written");
            checkPng(png, chart);
            assertEquals(2, suggested.size(), "the path was asked once an export");
            assertTrue(suggested.get(0).startsWith("inspection-hatch") && suggested.get(0).endsWith(".svg"),
                    "suggested SVG name " + suggested.get(0));
            assertTrue(suggested.get(1).endsWith(".png"), "suggested PNG name " + suggested.get(1));

            // An export that cannot be written says which file and why, and writes nothing.
            Path taken = Files.createDirectories(scratch.resolve("taken.svg"));
            ChartTools.choosePathsWith((shell, format, name) -> taken.toString());
            List<String> said = new ArrayList<>();
            answerDialog(driver, "Export chart", said);
            choose(menu, ChartTools.EXPORT_SVG);
            assertEquals(1, said.size(), "one error dialog: " + said);
            assertTrue(said.get(0).contains(taken.toString()) && said.get(0).contains("could not be exported"),
                    "the error names the file and says what failed: " + said.get(0));
            assertTrue(Files.isDirectory(taken), "the folder in the way is still a folder");
            try (Stream<Path> left = Files.list(scratch)) {
                assertTrue(left.noneMatch(p -> p.getFileName().toString().endsWith(".saving")), "a temporary file was left");
            }
            try (Stream<Path> inside = Files.list(taken)) {
                assertEquals(0, inside.count(), "something was written into the folder");
            }
        } finally {
            ChartTools.choosePathsWith(before);
        }
        driver.shot(driver.shell(), "chart-tools-exported.png");
    }

    /**
     * The pointer resting on a sample of the curve: the readout names time and angle with their
     * units, and the values it shows are those of a sample drawn within 2 px of the pointer.
     */
    private static void checkHover(WorkbenchDriver driver, Chart chart, ChartTools tools, Control plot)
            throws IOException {
        IAxis x = chart.getAxisSet().getXAxis(0);
        IAxis y = chart.getAxisSet().getYAxis(0);
        ISeries<?> curve = chart.getSeriesSet().getSeries("angle");
        double[] t = curve.getXSeries();
        double[] a = curve.getYSeries();
        Range r = x.getRange();
        int i = 0;
        while (i < t.length - 1 && t[i] < r.lower + 0.6 * (r.upper - r.lower)) {
            i++;
        }
        int px = x.getPixelCoordinate(t[i]);
        int py = y.getPixelCoordinate(a[i]);
        plot.notifyListeners(SWT.MouseMove, mouse(px, py, 0, 0, 0));
        driver.flush();
        ChartTools.Hover hover = tools.hover().orElseThrow(() -> new AssertionError("no readout at " + px + "," + py));
        Matcher m = READOUT.matcher(hover.text());
        assertTrue(m.matches(), "the readout does not say time (s) and angle (°): " + hover.text());
        double shownT = Double.parseDouble(m.group(1));
        double shownA = Double.parseDouble(m.group(2));
        // The shown values are rounded to about a thousandth of each axis's range.
        double dt = (r.upper - r.lower) / 1000;
        double da = (y.getRange().upper - y.getRange().lower) / 1000;
        boolean under = false;
        for (int k = 0; k < t.length && !under; k++) {
            under = Math.abs(t[k] - shownT) <= dt && Math.abs(a[k] - shownA) <= da
                    && Math.abs(x.getPixelCoordinate(t[k]) - px) <= 2 && Math.abs(y.getPixelCoordinate(a[k]) - py) <= 2;
        }
        assertTrue(under, "the readout " + hover.text() + " is not a sample under the pointer at " + t[i] + " s");
        driver.shot(driver.shell(), "chart-tools-hover.png");
        // Far from every sample (the plot's lower right corner, late in the decay) nothing is claimed.
        Point size = plot.getSize();
        plot.notifyListeners(SWT.MouseMove, mouse(size.x - 2, size.y - 2, 0, 0, 0));
        assertTrue(tools.hover().isEmpty(), "a readout far from every sample: " + tools.hover());
    }

    /** Every sample of every series is inside the axes' ranges, and the time axis is not much wider than the data. */
    private static void assertShowsAll(Chart chart, String when) {
        Range xr = chart.getAxisSet().getXAxis(0).getRange();
        Range yr = chart.getAxisSet().getYAxis(0).getRange();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (ISeries<?> s : chart.getSeriesSet().getSeries()) {
            for (double v : s.getXSeries()) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
            for (double v : s.getYSeries()) {
                assertTrue(v >= yr.lower && v <= yr.upper, when + ": " + s.getId() + " at " + v + " outside " + yr);
            }
        }
        assertTrue(xr.lower <= lo && xr.upper >= hi, when + ": time axis " + xr + " does not show " + lo + " to " + hi);
        assertTrue(xr.upper - xr.lower < 1.1 * (hi - lo), when + ": time axis " + xr + " far wider than the data");
    }

    /** Parses the SVG with the JDK's parser and reads it as a user would. */
    private static void checkSvg(Path svg, Chart chart, SwingChartContent content) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newDefaultInstance();
        factory.setNamespaceAware(true);
        Document doc = factory.newDocumentBuilder().parse(svg.toFile());
        Element root = doc.getDocumentElement();
        assertEquals("svg", root.getLocalName());
        assertEquals("http://www.w3.org/2000/svg", root.getNamespaceURI());
        NodeList polylines = root.getElementsByTagNameNS("*", "polyline");
        ISeries<?>[] series = chart.getSeriesSet().getSeries();
        assertEquals(series.length, polylines.getLength(), "one polyline a series");
        List<String> texts = new ArrayList<>();
        NodeList all = root.getElementsByTagNameNS("*", "text");
        for (int i = 0; i < all.getLength(); i++) {
            texts.add(all.item(i).getTextContent());
        }
        assertTrue(texts.contains("time (s)"), "no x-axis title with its unit in " + texts);
        assertTrue(texts.contains("angle (°)"), "no y-axis title with its unit in " + texts);
        assertTrue(texts.contains(content.title()), "no chart title in the SVG");

        // Where the SVG's own y-axis labels put the curve's highest and lowest points.
        TreeMap<Double, Double> yTicks = new TreeMap<>();
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if ("tick-label".equals(e.getAttribute("class")) && "end".equals(e.getAttribute("text-anchor"))) {
                yTicks.put(Double.parseDouble(e.getTextContent()), Double.parseDouble(e.getAttribute("y")));
            }
        }
        assertTrue(yTicks.size() >= 2, "y tick labels: " + yTicks);
        double v0 = yTicks.firstKey();
        double v1 = yTicks.lastKey();
        double perPixel = (v1 - v0) / (yTicks.get(v0) - yTicks.get(v1));
        Element angle = null;
        for (int i = 0; i < polylines.getLength(); i++) {
            Element e = (Element) polylines.item(i);
            if ("angle".equals(e.getAttribute("data-series"))) {
                angle = e;
            }
        }
        assertNotNull(angle, "no polyline of the angle");
        double top = Double.POSITIVE_INFINITY;
        double bottom = Double.NEGATIVE_INFINITY;
        String[] points = angle.getAttribute("points").trim().split("\\s+");
        for (String p : points) {
            double py = Double.parseDouble(p.substring(p.indexOf(',') + 1));
            top = Math.min(top, py);
            bottom = Math.max(bottom, py);
        }
        double highest = Arrays.stream(content.curve().y()).max().orElseThrow();
        double lowest = Arrays.stream(content.curve().y()).min().orElseThrow();
        double yAtTop = v0 + (yTicks.get(v0) - top) * perPixel;
        double yAtBottom = v0 + (yTicks.get(v0) - bottom) * perPixel;
        // within a pixel and a half of the drawing (coordinates are written to 0.01 px)
        assertEquals(highest, yAtTop, 1.5 * Math.abs(perPixel), "the curve's highest point in the SVG");
        assertEquals(lowest, yAtBottom, 1.5 * Math.abs(perPixel), "the curve's lowest point in the SVG");
        // at most four samples a pixel column (its first, lowest, highest and last: PlotThinning.perColumn), and the
        // sample just beyond each end of the visible span
        assertTrue(points.length <= 4 * chart.getSize().x + 2, "the curve is thinned to the columns: " + points.length);
    }

    /** The PNG decodes, has the chart's size and shows the dark blue curve. */
    private static void checkPng(Path png, Chart chart) {
        ImageData[] frames = new ImageLoader().load(png.toString());
        assertEquals(1, frames.length);
        ImageData data = frames[0];
        assertEquals(chart.getSize().x, data.width, "PNG width");
        assertEquals(chart.getSize().y, data.height, "PNG height");
        int blue = 0;
        for (int yy = 0; yy < data.height; yy++) {
            for (int xx = 0; xx < data.width; xx++) {
                RGB rgb = data.palette.getRGB(data.getPixel(xx, yy));
                if (rgb.blue > 90 && rgb.blue > rgb.red + 60 && rgb.blue > rgb.green + 60) {
                    blue++;
                }
            }
        }
        assertTrue(blue > 200, "the curve's dark blue is missing from the PNG: " + blue + " pixels");
    }

    private static void choose(Menu menu, String text) {
        menu.notifyListeners(SWT.Show, new Event());
        MenuItem found = null;
        for (MenuItem item : menu.getItems()) {
            if (text.equals(item.getText())) {
                found = item;
            }
        }
        assertNotNull(found, "no menu item " + text);
        assertTrue(found.isEnabled(), text + " is disabled");
        found.notifyListeners(SWT.Selection, new Event());
        menu.notifyListeners(SWT.Hide, new Event());
    }

    /** The context menu as the user sees it, opened over the plot. */
    private static void shotOfMenu(WorkbenchDriver driver, Control plot, Menu menu) throws IOException {
        Point size = plot.getSize();
        menu.setLocation(plot.toDisplay(size.x / 2, size.y / 3));
        menu.setVisible(true);
        driver.flush();
        try {
            driver.shot(driver.shell(), "chart-tools-menu.png");
        } finally {
            menu.setVisible(false);
            driver.flush();
        }
    }

    /**
     * Reads and closes the dialog with the given title once it opens (it runs its own event
     * loop, so this runs from a timer inside it); after about 10 s any dialog is closed so that a
     * failure cannot hang the workbench.
     */
    private static void answerDialog(WorkbenchDriver driver, String title, List<String> said) {
        Display display = driver.display();
        int[] tries = {0};
        Runnable[] probe = new Runnable[1];
        probe[0] = () -> {
            for (Shell s : display.getShells()) {
                if (s != driver.shell() && !s.isDisposed() && (title.equals(s.getText()) || tries[0] > 200)) {
                    said.add(title.equals(s.getText()) ? labels(s) : "another dialog: " + s.getText());
                    try {
                        driver.shot(s, "chart-tools-export-error.png");
                    } catch (IOException e) {
                        said.add("no screenshot: " + e.getMessage());
                    }
                    s.close();
                    return;
                }
            }
            tries[0]++;
            display.timerExec(50, probe[0]);
        };
        display.timerExec(50, probe[0]);
    }

    private static String labels(Composite c) {
        StringBuilder out = new StringBuilder();
        for (Control child : c.getChildren()) {
            if (child instanceof Label l) {
                out.append(l.getText()).append('\n');
            } else if (child instanceof Composite inner) {
                out.append(labels(inner));
            }
        }
        return out.toString();
    }

    private static Event mouse(int x, int y, int button, int count, int state) {
        Event e = new Event();
        e.x = x;
        e.y = y;
        e.button = button;
        e.count = count;
        e.stateMask = state;
        return e;
    }

    static Path copySample(Path target) throws IOException {
        Path sample = sampleFolder().orElseThrow(() -> new AssertionError(
                "samples/inspection-hatch not found above " + Path.of("").toAbsolutePath()));
        try (Stream<Path> files = Files.walk(sample)) {
            for (Path p : (Iterable<Path>) files::iterator) {
                Path to = target.resolve(sample.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(to);
                } else if (!p.getFileName().toString().startsWith(".")) {
                    Files.copy(p, to);
                }
            }
        }
        return target;
    }

    private static Optional<Path> sampleFolder() {
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            Path candidate = p.resolve("samples").resolve("inspection-hatch");
            if (Files.isDirectory(candidate)) {
                return Optional.of(candidate);
            }
        }
        return Optional.empty();
    }
}
