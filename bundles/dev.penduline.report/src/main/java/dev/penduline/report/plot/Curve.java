package dev.penduline.report.plot;

import java.util.Objects;

/**
 * A named curve to draw: abscissae and ordinates in the units of the picture's axes. The arrays
 * are not copied; a curve drawn as a line wants its abscissae ascending (it is thinned per pixel
 * column, {@link dev.penduline.services.present.PlotThinning#perColumn}). Points with a
 * non-finite ordinate are left out.
 *
 * @param name the name in the legend (unique within one picture)
 * @param x    the abscissae
 * @param y    the ordinates, as many as abscissae
 */
public record Curve(String name, double[] x, double[] y) {

    /**
     * Checks the parts.
     *
     * @throws NullPointerException     when a part is null
     * @throws IllegalArgumentException when the name is blank or the arrays differ in length
     */
    public Curve {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        if (name.isBlank()) {
            throw new IllegalArgumentException("a curve needs a name");
        }
        if (x.length != y.length) {
            throw new IllegalArgumentException("the curve " + name + " has " + x.length + " abscissae and " + y.length
                    + " ordinates");
        }
    }
}
