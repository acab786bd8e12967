package dev.penduline.physics.inertia;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The admissibility of a user-given tensor. Conditions: a real body's inertia tensor is
 * symmetric and positive semi-definite and no principal moment exceeds the sum of the other two
 * (Landau &amp; Lifshitz, Mechanics, §32; from memory).
 */
class TensorCheckTest {

    @Test
    void aRealBodyPasses() {
        // Box 12 kg 0.3×0.2×0.1 m turned 30° about z (see CadTensorTest): admissible.
        assertEquals(List.of(), TensorCheck.violations(new InertiaTensor(0.0625, 0.0875, 0.13, -0.0216506351, 0, 0)));
    }

    @Test
    void aThinPlateSitsOnTheTriangleInequalityAndPasses() {
        // Thin plate: Izz = Ixx + Iyy exactly (perpendicular-axis theorem, Meriam & Kraige
        // Appendix A). True moments 0.01234564 and 0.02345674, so Izz = 0.03580238; printed to six
        // significant digits 0.0123456 + 0.0234567 = 0.0358023 < 0.0358024: rounding crosses the
        // inequality, and the check must not call that an error.
        assertEquals(List.of(), TensorCheck.violations(InertiaTensor.diagonal(0.0123456, 0.0234567, 0.0358024)));
        // ... while a 1 % excess is reported.
        assertEquals(2, TensorCheck.violations(InertiaTensor.diagonal(0.0123456, 0.0234567, 0.0361604)).size());
    }

    @Test
    void asymmetryIsReported() {
        final List<String> v = TensorCheck.violations(new double[][] {{1, 0.2, 0}, {0.1, 1, 0}, {0, 0, 1}}, 1e-9);
        assertTrue(v.stream().anyMatch(s -> s.contains("not symmetric") && s.contains("Ixy")), v.toString());
    }

    @Test
    void negativePrincipalMomentIsReported() {
        // Eigenvalues of [[1, 2, 0], [2, 1, 0], [0, 0, 1]] are 3, 1, −1 (hand computation).
        final List<String> v = TensorCheck.violations(new double[][] {{1, 2, 0}, {2, 1, 0}, {0, 0, 1}}, 1e-9);
        assertTrue(v.stream().anyMatch(s -> s.contains("positive semi-definite") && s.contains("-1.00000")), v.toString());
    }

    @Test
    void triangleInequalityIsReported() {
        // diag(1, 1, 3): positive definite but 1 + 1 < 3, impossible for a body.
        final List<String> v = TensorCheck.violations(InertiaTensor.diagonal(1, 1, 3));
        assertTrue(v.stream().anyMatch(s -> s.contains("triangle")), v.toString());
        assertTrue(v.stream().anyMatch(s -> s.contains("Ixx + Iyy")), v.toString());
        assertTrue(v.stream().noneMatch(s -> s.contains("semi-definite")), v.toString());
    }

    @Test
    void wrongShapeIsReported() {
        assertEquals(1, TensorCheck.violations(new double[][] {{1, 0}, {0, 1}}, 1e-9).size());
        assertTrue(TensorCheck.violations(new double[][] {{1, 0, 0}, {0, Double.NaN, 0}, {0, 0, 1}}, 1e-9)
                .get(0).contains("non-finite"));
    }
}
