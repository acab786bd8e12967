package dev.penduline.report.plot;

import org.jfree.chart.renderer.category.StatisticalBarRenderer;

/** Grey bars with black ±1σ error bars (none where σ is unknown). */
final class ErrorBarRenderer extends StatisticalBarRenderer {

    private static final long serialVersionUID = 1L;

    ErrorBarRenderer() {
        BarRenderers.flat(this);
        setErrorIndicatorPaint(PlotStyle.BLACK);
        setErrorIndicatorStroke(PlotStyle.stroke(1.25f));
        setMaximumBarWidth(0.15);
    }
}
