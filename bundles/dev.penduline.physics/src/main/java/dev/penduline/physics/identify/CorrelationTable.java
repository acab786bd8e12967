package dev.penduline.physics.identify;

import java.util.List;

/**
 * Correlation coefficients between the fitted parameters, from the Jacobian at the optimum.
 * Parameters on a bound are left out.
 *
 * @param names  the parameters, in row and column order
 * @param values the symmetric matrix of correlations, ones on the diagonal (copied)
 */
public record CorrelationTable(List<String> names, double[][] values) {

    /**
     * Copies the inputs and checks their shape.
     *
     * @throws IllegalArgumentException when the matrix is not square of the names' size
     */
    public CorrelationTable {
        names = List.copyOf(names);
        final double[][] copy = new double[values.length][];
        for (int i = 0; i < values.length; i++) {
            if (values[i].length != names.size()) {
                throw new IllegalArgumentException("correlation row " + i + " has " + values[i].length
                        + " entries for " + names.size() + " names");
            }
            copy[i] = values[i].clone();
        }
        if (copy.length != names.size()) {
            throw new IllegalArgumentException(copy.length + " correlation rows for " + names.size() + " names");
        }
        values = copy;
    }

    /**
     * The matrix.
     *
     * @return a copy of the correlations
     */
    @Override
    public double[][] values() {
        final double[][] copy = new double[values.length][];
        for (int i = 0; i < values.length; i++) {
            copy[i] = values[i].clone();
        }
        return copy;
    }

    /**
     * The correlation of two named parameters.
     *
     * @param a one parameter's name
     * @param b the other's
     * @return the coefficient, or NaN when either is not in the table
     */
    public double get(String a, String b) {
        final int i = names.indexOf(a);
        final int j = names.indexOf(b);
        return i < 0 || j < 0 ? Double.NaN : values[i][j];
    }
}
