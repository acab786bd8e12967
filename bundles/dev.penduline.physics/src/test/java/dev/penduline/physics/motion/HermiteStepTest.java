package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.analysis.polynomials.PolynomialFunction;
import org.junit.jupiter.api.Test;

class HermiteStepTest {

    /**
     * Values and derivatives at four nodes determine a polynomial of degree 7 (Burden &amp;
     * Faires, Numerical Analysis, §3.4): a random one, evaluated by Hipparchus'
     * PolynomialFunction, is reproduced to rounding at 50 times across a step; one of degree 8
     * is not (the check can fail), which is why the step's continuous extension must be of
     * degree 7 (DOP853's is).
     */
    @Test
    void reproducesDegreeSevenAndOnlyThat() {
        final Random random = new Random(11);
        final double[] seven = new double[8];
        final double[] eight = new double[9];
        for (int k = 0; k < eight.length; k++) {
            eight[k] = random.nextGaussian();
            if (k < seven.length) {
                seven[k] = eight[k];
            }
        }
        eight[8] = 50;
        final double from = 0.3;
        final double to = 0.8;
        assertEquals(0, maxError(new PolynomialFunction(seven), from, to), 1e-14);
        assertTrue(maxError(new PolynomialFunction(eight), from, to) > 1e-6);
    }

    private static double maxError(PolynomialFunction p, double from, double to) {
        final PolynomialFunction derivative = p.polynomialDerivative();
        final HermiteStep step = new HermiteStep(1);
        step.begin(from, to);
        for (int j = 0; j < HermiteStep.NODES; j++) {
            final double t = step.nodeTime(j);
            step.set(0, j, p.value(t), derivative.value(t));
        }
        step.transform();
        double error = 0;
        for (int i = 0; i <= 50; i++) {
            final double t = from + (to - from) * i / 50;
            error = Math.max(error, Math.abs(step.value(0, t) - p.value(t)));
        }
        return error;
    }
}
