package dev.penduline.physics.inertia;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.MatrixUtils;

/**
 * Whether a user-given inertia tensor can belong to a real body: symmetric, positive
 * semi-definite, and its principal moments obeying the triangle inequalities
 * {@code I1 + I2 ≥ I3} (each moment is a sum of two of the three non-negative second moments
 * ∫x² dm, ∫y² dm, ∫z² dm, so no one can exceed the other two together).
 *
 * <p>The checks allow a slack proportional to the largest entry, because exported tensors are
 * rounded: a thin plate sits exactly on the triangle inequality and its rounded moments may
 * cross it by a few units of the last printed digit.
 */
public final class TensorCheck {

    /**
     * Default relative slack: 1e-5 of the largest entry, enough to absorb values rounded to six
     * significant digits (three rounded moments may cross the triangle inequality by about
     * three units of the sixth digit).
     */
    public static final double DEFAULT_SLACK = 1e-5;

    private TensorCheck() {
    }

    /**
     * Lists what is wrong with a tensor, with the default slack.
     *
     * @param tensor the tensor (kg·m²)
     * @return the violations, empty when the tensor is admissible
     */
    public static List<String> violations(InertiaTensor tensor) {
        return violations(tensor.toMatrix(), DEFAULT_SLACK);
    }

    /**
     * Lists what is wrong with a full 3×3 matrix given as an inertia tensor.
     *
     * @param m             the matrix (kg·m²), rows then columns
     * @param relativeSlack tolerance relative to the largest entry (dimensionless, ≥ 0)
     * @return human-readable violations, empty when the matrix is an admissible inertia tensor
     */
    public static List<String> violations(double[][] m, double relativeSlack) {
        final List<String> out = new ArrayList<>();
        if (m == null || m.length != 3 || m[0] == null || m[1] == null || m[2] == null
                || m[0].length != 3 || m[1].length != 3 || m[2].length != 3) {
            out.add("the inertia tensor must be a 3×3 matrix");
            return out;
        }
        double scale = 0;
        for (double[] row : m) {
            for (double e : row) {
                if (!Double.isFinite(e)) {
                    out.add("the inertia tensor has a non-finite entry " + e);
                    return out;
                }
                scale = Math.max(scale, Math.abs(e));
            }
        }
        final double slack = relativeSlack * scale;
        final String[] names = {"x", "y", "z"};
        for (int i = 0; i < 3; i++) {
            for (int j = i + 1; j < 3; j++) {
                if (Math.abs(m[i][j] - m[j][i]) > slack) {
                    out.add(String.format(Locale.ROOT, "not symmetric: I%s%s = %.6g but I%s%s = %.6g kg·m²",
                            names[i], names[j], m[i][j], names[j], names[i], m[j][i]));
                }
            }
        }
        final double[][] sym = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                sym[i][j] = 0.5 * (m[i][j] + m[j][i]);
            }
        }
        if (scale == 0) {
            return out;
        }
        final double[] p = new EigenDecompositionSymmetric(MatrixUtils.createRealMatrix(sym)).getEigenvalues();
        for (double lambda : p) {
            if (lambda < -slack) {
                out.add(String.format(Locale.ROOT,
                        "not positive semi-definite: principal moment %.6g kg·m² is negative", lambda));
            }
        }
        for (int k = 0; k < 3; k++) {
            final int i = (k + 1) % 3;
            final int j = (k + 2) % 3;
            if (m[i][i] + m[j][j] < m[k][k] - slack) {
                out.add(String.format(Locale.ROOT, "I%s%s + I%s%s = %.6g is less than I%s%s = %.6g kg·m²",
                        names[i], names[i], names[j], names[j], m[i][i] + m[j][j], names[k], names[k], m[k][k]));
            }
        }
        // p is sorted largest first, so the only inequality that can fail is p1 + p2 ≥ p0.
        if (p[1] + p[2] < p[0] - slack) {
            out.add(String.format(Locale.ROOT, "principal moments %.6g, %.6g, %.6g kg·m² violate the triangle"
                    + " inequality: %.6g + %.6g < %.6g (no real body has them)", p[0], p[1], p[2], p[1], p[2], p[0]));
        }
        return out;
    }
}
