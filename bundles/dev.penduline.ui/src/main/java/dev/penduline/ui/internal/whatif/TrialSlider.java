package dev.penduline.ui.internal.whatif;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Scale;
import org.eclipse.swt.widgets.Spinner;

import dev.penduline.services.present.Figures;

/**
 * One value of a swing trial as a slider and a spinner kept in step, with its unit and, for a
 * fitted friction term, the fit's value ± its standard uncertainty beside it and marked under the
 * slider (the ±1σ and ±2σ intervals and the fitted value). The value is the spinner's, so what
 * is simulated is what the user reads.
 */
final class TrialSlider {

    /** Steps of the slider over its range. */
    static final int STEPS = 1000;

    private final Scale scale;
    private final Spinner spinner;
    private final Label band;
    private final Canvas marks;
    private final Runnable changed;
    private double lo;
    private double hi = 1;
    private double fitted = Double.NaN;
    private double sigma = Double.NaN;
    private boolean quiet;

    /**
     * Adds the row's widgets to a grid of five columns: name, slider, spinner, unit, band.
     *
     * @param parent  the grid
     * @param name    what the value is
     * @param unit    its unit
     * @param changed runs after the user changed the value
     */
    TrialSlider(Composite parent, String name, String unit, Runnable changed) {
        this.changed = changed;
        new Label(parent, SWT.NONE).setText(name);
        Composite slider = new Composite(parent, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).hint(160, SWT.DEFAULT).applyTo(slider);
        GridLayoutFactory.fillDefaults().spacing(0, 0).applyTo(slider);
        scale = new Scale(slider, SWT.HORIZONTAL);
        scale.setMinimum(0);
        scale.setMaximum(STEPS);
        scale.setPageIncrement(STEPS / 20);
        scale.setToolTipText(name + " (" + unit + ")");
        GridDataFactory.fillDefaults().grab(true, false).applyTo(scale);
        marks = new Canvas(slider, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).hint(SWT.DEFAULT, 7).applyTo(marks);
        marks.addListener(SWT.Paint, e -> paintBand(e.gc));
        spinner = new Spinner(parent, SWT.BORDER);
        GridDataFactory.fillDefaults().hint(90, SWT.DEFAULT).applyTo(spinner);
        new Label(parent, SWT.NONE).setText(unit);
        band = new Label(parent, SWT.NONE);
        GridDataFactory.fillDefaults().grab(false, false).hint(190, SWT.DEFAULT).applyTo(band);
        scale.addListener(SWT.Selection, e -> {
            if (!quiet) {
                setQuietly(lo + (hi - lo) * scale.getSelection() / STEPS, false);
                changed.run();
            }
        });
        spinner.addListener(SWT.Modify, e -> {
            if (!quiet) {
                quiet = true;
                try {
                    scale.setSelection(position(value()));
                } finally {
                    quiet = false;
                }
                changed.run();
            }
        });
    }

    /**
     * Sets the range and the value, without telling the listener.
     *
     * @param from      the lower end of the range
     * @param to        the upper end (above {@code from})
     * @param value     the value to show
     * @param fit       the fitted value whose band is marked, NaN for none
     * @param fitSigma  its standard uncertainty, NaN when unknown
     * @param fitText   what the band label says (empty for none)
     */
    void configure(double from, double to, double value, double fit, double fitSigma, String fitText) {
        lo = from;
        hi = to > from ? to : from + 1;
        fitted = fit;
        sigma = fitSigma;
        // enough decimals for a thousandth of the range: the spinner resolves what the slider does
        int digits = Math.max(0, Math.min(9, (int) Math.ceil(-Math.log10((hi - lo) / (10.0 * STEPS)))));
        double scaleUp = Math.pow(10, digits);
        quiet = true;
        try {
            spinner.setDigits(digits);
            spinner.setMinimum((int) Math.floor(lo * scaleUp));
            spinner.setMaximum((int) Math.ceil(hi * scaleUp));
            spinner.setIncrement(Math.max(1, (int) Math.round((hi - lo) * scaleUp / STEPS)));
            spinner.setPageIncrement(Math.max(1, (int) Math.round((hi - lo) * scaleUp / 20)));
        } finally {
            quiet = false;
        }
        setQuietly(value, true);
        band.setText(fitText);
        band.setToolTipText(fitText.isEmpty() ? null : fitText + " (one standard uncertainty; the marks under the slider "
                + "show ±1σ and ±2σ about the fitted value)");
        marks.redraw();
    }

    private void setQuietly(double value, boolean moveScale) {
        quiet = true;
        try {
            double scaleUp = Math.pow(10, spinner.getDigits());
            spinner.setSelection((int) Math.round(Math.max(lo, Math.min(hi, value)) * scaleUp));
            if (moveScale) {
                scale.setSelection(position(value()));
            }
        } finally {
            quiet = false;
        }
    }

    private int position(double v) {
        return (int) Math.round(Math.max(0, Math.min(STEPS, (v - lo) / (hi - lo) * STEPS)));
    }

    /**
     * The value, as the spinner shows it.
     *
     * @return the value in the row's unit
     */
    double value() {
        return spinner.getSelection() / Math.pow(10, spinner.getDigits());
    }

    /** @return the slider */
    Scale scale() {
        return scale;
    }

    /** @return the spinner */
    Spinner spinner() {
        return spinner;
    }

    /** @return what the band label says */
    String bandText() {
        return band.getText();
    }

    void setEnabled(boolean enabled) {
        scale.setEnabled(enabled);
        spinner.setEnabled(enabled);
    }

    /** The range as a thin line, the ±2σ and ±1σ intervals as bars, the fitted value as a tick. */
    private void paintBand(GC gc) {
        Point size = marks.getSize();
        // the slider's thumb travels about its own half-width short of either end
        int inset = 10;
        int width = Math.max(1, size.x - 2 * inset);
        gc.setForeground(marks.getDisplay().getSystemColor(SWT.COLOR_WIDGET_NORMAL_SHADOW));
        gc.drawLine(inset, size.y / 2, inset + width, size.y / 2);
        if (!Double.isFinite(fitted)) {
            return;
        }
        if (Double.isFinite(sigma) && sigma > 0) {
            for (int k = 2; k >= 1; k--) {
                int a = inset + (int) Math.round(width * clamp((fitted - k * sigma - lo) / (hi - lo)));
                int b = inset + (int) Math.round(width * clamp((fitted + k * sigma - lo) / (hi - lo)));
                gc.setBackground(marks.getDisplay().getSystemColor(k == 2 ? SWT.COLOR_GRAY : SWT.COLOR_DARK_GREEN));
                gc.fillRectangle(a, 1, Math.max(2, b - a), size.y - 2);
            }
        }
        int at = inset + (int) Math.round(width * clamp((fitted - lo) / (hi - lo)));
        gc.setForeground(marks.getDisplay().getSystemColor(SWT.COLOR_BLACK));
        gc.drawLine(at, 0, at, size.y);
    }

    private static double clamp(double v) {
        return Math.max(0, Math.min(1, v));
    }

    /**
     * The band label's text of a fitted value.
     *
     * @param value the fitted value
     * @param sigma its standard uncertainty
     * @return "fit value ± u", as every report writes it
     */
    static String fitText(double value, double sigma) {
        return "fit " + Figures.measured(value, sigma);
    }
}
