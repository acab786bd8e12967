package dev.penduline.ui.internal.chart;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.events.PaintEvent;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ICustomPaintListener;
import org.eclipse.swtchart.ISeries;
import org.eclipse.swtchart.Range;

import dev.penduline.model.persistence.AtomicFileWrite;

/**
 * What every chart of the workbench offers, added to an SWTChart {@link Chart} by
 * {@link #install(Chart)}: the mouse wheel zooms the time (x) axis about the cursor (with Ctrl,
 * the y axis), dragging pans, a double click or <i>Show All</i> shows all the data again,
 * hovering shows the nearest sample's values with the axes' units, and the context menu exports
 * the chart as PNG (what the chart shows) or SVG (drawn from the series' own data, so it stays
 * sharp). Files are written atomically; the file dialog can be replaced for tests
 * ({@link #choosePathsWith(PathChooser)}).
 */
public final class ChartTools {

    /** Chooses the file an export writes to. */
    @FunctionalInterface
    public interface PathChooser {
        /**
         * Asks where to write.
         *
         * @param shell     the chart's shell, for a dialog
         * @param format    the file's format, "png" or "svg"
         * @param suggested a file name to offer
         * @return the path, or null when the user cancels
         */
        String choose(Shell shell, String format, String suggested);
    }

    /**
     * What the hover readout shows: the nearest sample of a series.
     *
     * @param seriesId the series' id
     * @param index    the sample's position in the series
     * @param x        its abscissa, in the x axis's unit
     * @param y        its ordinate, in the y axis's unit
     * @param text     the readout as shown ("series: time 1.23 s, angle 4.56 °")
     */
    public record Hover(String seriesId, int index, double x, double y, String text) {
    }

    /** The menu item that shows all the data again. */
    public static final String SHOW_ALL = "Show All";
    /** The menu item that exports a PNG. */
    public static final String EXPORT_PNG = "Export as PNG\u2026";
    /** The menu item that exports an SVG. */
    public static final String EXPORT_SVG = "Export as SVG\u2026";

    /** Each wheel notch shows this share of the range. */
    static final double ZOOM_STEP = 0.8;
    /** The hover readout shows a sample only this close to the cursor, in pixels. */
    static final int HOVER_REACH = 40;

    private static final String KEY = ChartTools.class.getName();
    private static final Pattern TITLE = Pattern.compile("(.*\\S)\\s*\\(([^()]+)\\)\\s*");
    private static final PathChooser DIALOG = ChartTools::askWithDialog;
    private static volatile PathChooser chooser = DIALOG;

    private final Chart chart;
    private final Control plot;
    private final MenuManager menu;
    private Optional<Hover> hover = Optional.empty();
    private Point dragFrom;
    private Range dragX;
    private Range dragY;

    private ChartTools(Chart chart) {
        this.chart = chart;
        this.plot = chart.getPlotArea().getControl();
        plot.addListener(SWT.MouseVerticalWheel, this::wheel);
        plot.addListener(SWT.MouseDown, this::down);
        plot.addListener(SWT.MouseMove, this::move);
        plot.addListener(SWT.MouseUp, e -> endDrag());
        plot.addListener(SWT.MouseExit, e -> setHover(Optional.empty()));
        plot.addListener(SWT.MouseDoubleClick, e -> {
            if (e.button == 1) {
                showAll();
            }
        });
        chart.getPlotArea().addCustomPaintListener(new ICustomPaintListener() {
            @Override
            public void paintControl(PaintEvent e) {
                paintHover(e.gc);
            }
        });
        menu = new MenuManager();
        menu.add(action(SHOW_ALL, this::showAll));
        menu.add(new Separator());
        menu.add(action(EXPORT_PNG, () -> export("png")));
        menu.add(action(EXPORT_SVG, () -> export("svg")));
        Menu contextMenu = menu.createContextMenu(chart);
        setMenu(chart, contextMenu);
        chart.addListener(SWT.Dispose, e -> menu.dispose());
        chart.setData(KEY, this);
    }

    /**
     * Adds zoom, pan, the hover readout and the export menu to a chart (once; a second call gives
     * the same tools).
     *
     * @param chart the chart, with its axis titles naming their units as "quantity (unit)"
     * @return the chart's tools
     */
    public static ChartTools install(Chart chart) {
        ChartTools existing = of(chart);
        return existing != null ? existing : new ChartTools(chart);
    }

    /**
     * The tools installed on a chart.
     *
     * @param chart the chart
     * @return its tools, or null when none were installed
     */
    public static ChartTools of(Chart chart) {
        return chart.getData(KEY) instanceof ChartTools t ? t : null;
    }

    /**
     * Replaces the file dialog of the exports, for tests.
     *
     * @param next the chooser to use; null restores the file dialog
     * @return the chooser used until now
     */
    public static PathChooser choosePathsWith(PathChooser next) {
        PathChooser before = chooser;
        chooser = next == null ? DIALOG : next;
        return before;
    }

    /**
     * The sample the hover readout shows now.
     *
     * @return the sample, empty when the cursor is not near one
     */
    public Optional<Hover> hover() {
        return hover;
    }

    /** Shows all the data again (as after a double click or <i>Show All</i>). */
    public void showAll() {
        chart.getAxisSet().adjustRange();
        refresh();
    }

    private void wheel(Event e) {
        if (e.count == 0 || dragFrom != null) {
            return;
        }
        double factor = Math.pow(ZOOM_STEP, Math.signum(e.count));
        Point size = plot.getSize();
        if ((e.stateMask & SWT.MOD1) != 0) {
            zoomAbout(chart.getAxisSet().getYAxis(0), 1 - (double) e.y / size.y, factor);
        } else {
            zoomAbout(chart.getAxisSet().getXAxis(0), (double) e.x / size.x, factor);
        }
        setHover(Optional.empty());
        refresh();
    }

    /**
     * Scales an axis's range about a point so that the value there stays there.
     *
     * @param axis     the axis
     * @param share    where the point lies, 0 at the range's lower end and 1 at its upper end
     * @param factor   the new range's width over the old one's
     */
    private static void zoomAbout(IAxis axis, double share, double factor) {
        Range r = axis.getRange();
        double at = r.lower + share * (r.upper - r.lower);
        double lower = at - (at - r.lower) * factor;
        double upper = at + (r.upper - at) * factor;
        if (upper - lower > Math.ulp(at) * 64) {
            axis.setRange(new Range(lower, upper));
        }
    }

    private void down(Event e) {
        if (e.button == 1 && e.count < 2) {
            dragFrom = new Point(e.x, e.y);
            dragX = axisRange(true);
            dragY = axisRange(false);
            setHover(Optional.empty());
        }
    }

    private void move(Event e) {
        if (dragFrom != null && (e.stateMask & SWT.BUTTON1) != 0) {
            Point size = plot.getSize();
            double dx = (e.x - dragFrom.x) * (dragX.upper - dragX.lower) / Math.max(1, size.x);
            double dy = (e.y - dragFrom.y) * (dragY.upper - dragY.lower) / Math.max(1, size.y);
            chart.getAxisSet().getXAxis(0).setRange(new Range(dragX.lower - dx, dragX.upper - dx));
            chart.getAxisSet().getYAxis(0).setRange(new Range(dragY.lower + dy, dragY.upper + dy));
            refresh();
            return;
        }
        endDrag();
        setHover(nearest(e.x, e.y));
    }

    private void endDrag() {
        dragFrom = null;
    }

    private Range axisRange(boolean x) {
        IAxis axis = x ? chart.getAxisSet().getXAxis(0) : chart.getAxisSet().getYAxis(0);
        return new Range(axis.getRange());
    }

    /** The sample of a visible series nearest to a pixel of the plot, if one is near enough. */
    private Optional<Hover> nearest(int px, int py) {
        IAxis xAxis = chart.getAxisSet().getXAxis(0);
        IAxis yAxis = chart.getAxisSet().getYAxis(0);
        Range xr = xAxis.getRange();
        Range yr = yAxis.getRange();
        Point size = plot.getSize();
        double sx = size.x / (xr.upper - xr.lower);
        double sy = size.y / (yr.upper - yr.lower);
        double best = (double) HOVER_REACH * HOVER_REACH;
        ISeries<?> found = null;
        int index = -1;
        for (ISeries<?> s : chart.getSeriesSet().getSeries()) {
            if (!s.isVisible()) {
                continue;
            }
            double[] x = s.getXSeries();
            double[] y = s.getYSeries();
            for (int i = 0; i < Math.min(x.length, y.length); i++) {
                double dx = (x[i] - xr.lower) * sx - px;
                double dy = size.y - (y[i] - yr.lower) * sy - py;
                double d = dx * dx + dy * dy;
                if (d < best) {
                    best = d;
                    found = s;
                    index = i;
                }
            }
        }
        if (found == null) {
            return Optional.empty();
        }
        double x = found.getXSeries()[index];
        double y = found.getYSeries()[index];
        String name = found.getDescription() == null ? found.getId() : found.getDescription();
        String text = name + ": " + reading(xAxis, x) + ", " + reading(yAxis, y);
        return Optional.of(new Hover(found.getId(), index, x, y, text));
    }

    /** A value as "quantity value unit", with as many decimals as the axis's range needs. */
    static String reading(IAxis axis, double value) {
        Range r = axis.getRange();
        String number = decimals(value, r.upper - r.lower, 1000);
        String title = axis.getTitle().getText();
        Matcher m = TITLE.matcher(title == null ? "" : title);
        if (m.matches()) {
            return m.group(1) + " " + number + " " + m.group(2);
        }
        return (title == null || title.isBlank() ? "" : title + " ") + number;
    }

    /**
     * A value written to the place that tells apart one part in {@code parts} of a span.
     *
     * @param value the value
     * @param span  the span it lies in (an axis's range)
     * @param parts how finely to tell values apart
     * @return the text, in the root locale
     */
    static String decimals(double value, double span, double parts) {
        int places = 0;
        if (span > 0 && Double.isFinite(span)) {
            places = (int) Math.max(0, Math.min(12, Math.ceil(-Math.log10(span / parts))));
        }
        return String.format(Locale.ROOT, "%." + places + "f", value);
    }

    private void setHover(Optional<Hover> next) {
        if (!next.equals(hover)) {
            hover = next;
            plot.redraw();
        }
    }

    private void paintHover(GC gc) {
        if (hover.isEmpty()) {
            return;
        }
        Hover h = hover.get();
        int x = chart.getAxisSet().getXAxis(0).getPixelCoordinate(h.x());
        int y = chart.getAxisSet().getYAxis(0).getPixelCoordinate(h.y());
        gc.setAntialias(SWT.ON);
        gc.setLineWidth(2);
        gc.setForeground(chart.getDisplay().getSystemColor(SWT.COLOR_BLACK));
        gc.drawOval(x - 4, y - 4, 8, 8);
        Point text = gc.textExtent(h.text());
        Point size = plot.getSize();
        int left = Math.max(2, Math.min(x + 10, size.x - text.x - 8));
        int top = y - text.y - 14 < 2 ? y + 10 : y - text.y - 14;
        gc.setBackground(chart.getDisplay().getSystemColor(SWT.COLOR_INFO_BACKGROUND));
        gc.setForeground(chart.getDisplay().getSystemColor(SWT.COLOR_INFO_FOREGROUND));
        gc.setLineWidth(1);
        gc.fillRectangle(left, top, text.x + 8, text.y + 4);
        gc.drawRectangle(left, top, text.x + 8, text.y + 4);
        gc.drawText(h.text(), left + 4, top + 2, true);
    }

    private void refresh() {
        chart.updateLayout();
        chart.redraw();
    }

    private void export(String format) {
        setHover(Optional.empty());
        chart.update();
        String chosen = chooser.choose(chart.getShell(), format, suggestedName(format));
        if (chosen == null || chosen.isBlank()) {
            return;
        }
        Path target = Path.of(chosen.endsWith("." + format) ? chosen : chosen + "." + format);
        try {
            if ("png".equals(format)) {
                ImageData picture = snapshot();
                AtomicFileWrite.write(target, out -> {
                    ImageLoader loader = new ImageLoader();
                    loader.data = new ImageData[] {picture};
                    loader.save(out, SWT.IMAGE_PNG);
                });
            } else {
                ChartSvg svg = ChartSvg.of(chart);
                AtomicFileWrite.write(target, svg::writeTo);
            }
        } catch (IOException | RuntimeException e) {
            MessageDialog.openError(chart.getShell(), "Export chart",
                    target + ": the chart could not be exported: "
                            + (e.getMessage() == null ? "the file could not be written" : e.getMessage()));
        }
    }

    /** What the chart shows, as the user sees it. */
    private ImageData snapshot() {
        Point size = chart.getSize();
        Image image = new Image(chart.getDisplay(), Math.max(1, size.x), Math.max(1, size.y));
        GC gc = new GC(image);
        try {
            chart.print(gc);
        } finally {
            gc.dispose();
        }
        try {
            return image.getImageData();
        } finally {
            image.dispose();
        }
    }

    private String suggestedName(String format) {
        String title = chart.getTitle().getText();
        String base = title == null ? "" : title.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-")
                .replaceAll("^-+|-+$", "");
        if (base.length() > 60) {
            base = base.substring(0, 60).replaceAll("-+$", "");
        }
        return (base.isEmpty() ? "chart" : base) + "." + format;
    }

    private static String askWithDialog(Shell shell, String format, String suggested) {
        FileDialog dialog = new FileDialog(shell, SWT.SAVE);
        dialog.setText("Export Chart as " + format.toUpperCase(Locale.ROOT));
        dialog.setFilterExtensions(new String[] {"*." + format});
        dialog.setFilterNames(new String[] {format.toUpperCase(Locale.ROOT) + " image (*." + format + ")"});
        dialog.setFileName(suggested);
        dialog.setOverwrite(true);
        return dialog.open();
    }

    private static Action action(String text, Runnable run) {
        return new Action(text) {
            @Override
            public void run() {
                run.run();
            }
        };
    }

    private static void setMenu(Control control, Menu contextMenu) {
        control.setMenu(contextMenu);
        if (control instanceof Composite c) {
            for (Control child : c.getChildren()) {
                setMenu(child, contextMenu);
            }
        }
    }
}
