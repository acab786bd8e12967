package dev.penduline.physics.swing;

import java.util.Arrays;

/**
 * A least-squares polynomial fitted to a run of samples about a centre time, reusing its sums
 * so that filtering a long record makes only a few tiny arrays per sample. Times are scaled before the
 * normal equations are formed, which keeps them well conditioned for the low orders used here.
 */
final class LocalPolynomial {

    private final int terms;
    private final double[][] normal;
    private final double[] rhs;
    private final double[] powers;
    private final double[] sums;
    private double[] coefficients;
    private double scale;

    LocalPolynomial(int order) {
        this.terms = order + 1;
        this.normal = new double[terms][terms];
        this.rhs = new double[terms];
        this.powers = new double[2 * terms - 1];
        this.sums = new double[2 * terms - 1];
    }

    /** Fits samples [from, to) with u = (t − centre)/scale; false when the system is singular. */
    boolean fit(double[] t, double[] y, int from, int to, double centre, double scaleTime) {
        this.scale = scaleTime;
        Arrays.fill(sums, 0);
        Arrays.fill(rhs, 0);
        for (int j = from; j < to; j++) {
            final double u = (t[j] - centre) / scaleTime;
            double p = 1;
            for (int k = 0; k < powers.length; k++) {
                powers[k] = p;
                p *= u;
            }
            for (int k = 0; k < sums.length; k++) {
                sums[k] += powers[k];
            }
            for (int k = 0; k < terms; k++) {
                rhs[k] += powers[k] * y[j];
            }
        }
        for (int a = 0; a < terms; a++) {
            for (int b = 0; b < terms; b++) {
                normal[a][b] = sums[a + b];
            }
        }
        coefficients = solve(normal, rhs.clone(), terms);
        return coefficients != null;
    }

    /** Value of the polynomial at the centre time. */
    double value() {
        return coefficients == null ? Double.NaN : coefficients[0];
    }

    /** Slope at the centre time, per unit of time. */
    double slope() {
        return coefficients == null || terms < 2 ? Double.NaN : coefficients[1] / scale;
    }

    /** Second derivative at the centre time, per unit of time squared. */
    double curvature() {
        return coefficients == null || terms < 3 ? Double.NaN : 2 * coefficients[2] / (scale * scale);
    }

    /**
     * Solves {@code a x = b} for a small dense system by Gaussian elimination with partial
     * pivoting; {@code a} and {@code b} are overwritten.
     *
     * @return x, or null when the matrix is singular
     */
    static double[] solve(double[][] a, double[] b, int n) {
        final double[][] m = new double[n][];
        for (int i = 0; i < n; i++) {
            m[i] = a[i].clone();
        }
        for (int c = 0; c < n; c++) {
            int pivot = c;
            for (int r = c + 1; r < n; r++) {
                if (Math.abs(m[r][c]) > Math.abs(m[pivot][c])) {
                    pivot = r;
                }
            }
            if (!(Math.abs(m[pivot][c]) > 1e-300)) {
                return null;
            }
            final double[] rowSwap = m[c];
            m[c] = m[pivot];
            m[pivot] = rowSwap;
            final double bSwap = b[c];
            b[c] = b[pivot];
            b[pivot] = bSwap;
            for (int r = c + 1; r < n; r++) {
                final double f = m[r][c] / m[c][c];
                for (int k = c; k < n; k++) {
                    m[r][k] -= f * m[c][k];
                }
                b[r] -= f * b[c];
            }
        }
        final double[] x = new double[n];
        for (int r = n - 1; r >= 0; r--) {
            double s = b[r];
            for (int k = r + 1; k < n; k++) {
                s -= m[r][k] * x[k];
            }
            x[r] = s / m[r][r];
        }
        return x;
    }
}
