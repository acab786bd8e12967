package dev.penduline.physics.swing;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;

/**
 * Non-negative least squares of the decrement on 1, Ā, Ā², by subsets (see DecrementRegression).
 * Among the feasible subsets the one with the lowest Bayesian information criterion wins
 * (Schwarz 1978, n ln(RSS/n) + p ln n): over the narrow amplitude range of one release, 1, Ā
 * and Ā² are nearly collinear, and the plain least-RSS choice would explain a purely viscous
 * decay as Coulomb plus drag; the penalty keeps a term only when the data need it.
 */
final class DecrementFitter {

    private static final String[] NAMES = {"a0", "a1", "a2"};

    private DecrementFitter() {
    }

    /** The fit, or null with fewer than two half-swings. */
    static DecrementRegression fit(double[] amplitude, double[] decrement) {
        final int n = amplitude.length;
        if (n < 2) {
            return null;
        }
        Candidate best = null;
        Candidate unconstrained = null;
        for (int mask = 1; mask < 8; mask++) {
            final int p = Integer.bitCount(mask);
            if (n <= p) {
                continue;
            }
            final Candidate c = solve(amplitude, decrement, mask);
            if (c == null) {
                continue;
            }
            if (mask == 7 || unconstrained == null) {
                unconstrained = c;
            }
            if (c.nonNegative() && (best == null || c.criterion(n) < best.criterion(n))) {
                best = c;
            }
        }
        final Candidate chosen = best != null ? best : unconstrained;
        if (chosen == null) {
            return null;
        }
        double mean = 0;
        for (double d : decrement) {
            mean += d;
        }
        mean /= n;
        double tss = 0;
        for (double d : decrement) {
            tss += (d - mean) * (d - mean);
        }
        final List<String> dropped = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            if ((chosen.mask & (1 << k)) == 0) {
                dropped.add(NAMES[k]);
            }
        }
        final int dof = n - Integer.bitCount(chosen.mask);
        return new DecrementRegression(chosen.coefficients[0], chosen.coefficients[1], chosen.coefficients[2],
                chosen.errors[0], chosen.errors[1], chosen.errors[2], tss > 0 ? 1 - chosen.rss / tss : 1,
                Math.sqrt(chosen.rss / dof), n, dropped);
    }

    private static Candidate solve(double[] amplitude, double[] decrement, int mask) {
        final int n = amplitude.length;
        final int p = Integer.bitCount(mask);
        final RealMatrix x = new Array2DRowRealMatrix(n, p);
        for (int i = 0; i < n; i++) {
            int col = 0;
            for (int k = 0; k < 3; k++) {
                if ((mask & (1 << k)) != 0) {
                    x.setEntry(i, col++, Math.pow(amplitude[i], k));
                }
            }
        }
        final RealVector y = new ArrayRealVector(decrement);
        final DecompositionSolver solver = new QRDecomposition(x, 1e-12).getSolver();
        if (!solver.isNonSingular()) {
            return null;
        }
        final RealVector beta = solver.solve(y);
        final RealVector residual = y.subtract(x.operate(beta));
        final double rss = residual.dotProduct(residual);
        final double s2 = rss / (n - p);
        final DecompositionSolver normal = new QRDecomposition(x.transposeMultiply(x), 1e-14).getSolver();
        if (!normal.isNonSingular()) {
            // amplitudes too alike to tell 1, Ā and Ā² apart: this subset is not identifiable
            return null;
        }
        final RealMatrix normalInverse = normal.getInverse();
        final double[] coefficients = new double[3];
        final double[] errors = {Double.NaN, Double.NaN, Double.NaN};
        int col = 0;
        for (int k = 0; k < 3; k++) {
            if ((mask & (1 << k)) != 0) {
                coefficients[k] = beta.getEntry(col);
                errors[k] = Math.sqrt(s2 * normalInverse.getEntry(col, col));
                col++;
            }
        }
        return new Candidate(mask, coefficients, errors, rss);
    }

    private record Candidate(int mask, double[] coefficients, double[] errors, double rss) {
        double criterion(int n) {
            // a perfect fit (rss = 0) would give −∞; the floor keeps the comparison finite
            return n * Math.log(Math.max(rss, 1e-300) / n) + Integer.bitCount(mask) * Math.log(n);
        }

        boolean nonNegative() {
            return coefficients[0] >= 0 && coefficients[1] >= 0 && coefficients[2] >= 0;
        }
    }
}
