package dev.penduline.physics.forecast;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.hipparchus.linear.RealMatrix;
import org.hipparchus.stat.correlation.Covariance;
import org.junit.jupiter.api.Test;

class ParameterDrawsTest {

    @Test
    void drawsHaveTheAskedMeansSpreadsAndCorrelations() {
        // Sample moments of N draws approach the distribution's within a few standard errors:
        // σ/√N for a mean, about (1 − ρ²)/√N for a correlation (law of large numbers; Fisher's
        // large-sample variance of the correlation coefficient). Sample covariance by Hipparchus.
        final double[] mean = {0.02, 0.15, 0.9};
        final double[] sigma = {0.004, 0.03, 0.0};
        final double[][] rho = {{1, -0.8, 0}, {-0.8, 1, 0}, {0, 0, 1}};
        final int n = 40000;
        final double[][] draws = ParameterDraws.draw(mean, sigma, rho, n, 7);
        final RealMatrix c = new Covariance(draws).getCovarianceMatrix();
        for (int i = 0; i < 2; i++) {
            double sum = 0;
            for (double[] d : draws) {
                sum += d[i];
            }
            assertEquals(mean[i], sum / n, 4 * sigma[i] / Math.sqrt(n), "mean " + i);
            assertEquals(sigma[i], Math.sqrt(c.getEntry(i, i)), 4 * sigma[i] / Math.sqrt(2.0 * n), "sigma " + i);
        }
        final double r = c.getEntry(0, 1) / Math.sqrt(c.getEntry(0, 0) * c.getEntry(1, 1));
        assertEquals(-0.8, r, 4 * (1 - 0.64) / Math.sqrt(n));
        for (double[] d : draws) {
            assertEquals(0.9, d[2], 0, "a parameter without spread stays at its mean");
        }
    }

    @Test
    void theSameSeedGivesTheSameDraws() {
        final double[][] rho = {{1, 0.3}, {0.3, 1}};
        final double[][] a = ParameterDraws.draw(new double[] {1, 2}, new double[] {0.1, 0.2}, rho, 5, 42);
        final double[][] b = ParameterDraws.draw(new double[] {1, 2}, new double[] {0.1, 0.2}, rho, 5, 42);
        for (int i = 0; i < a.length; i++) {
            assertArrayEquals(a[i], b[i], 0);
        }
    }

    @Test
    void aMatrixThatIsNotACorrelationIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> ParameterDraws.draw(new double[] {1, 2},
                new double[] {0.1, 0.2}, new double[][] {{1, 1.5}, {1.5, 1}}, 5, 1));
        assertThrows(IllegalArgumentException.class, () -> ParameterDraws.draw(new double[] {1, 2},
                new double[] {0.1, 0.2}, new double[][] {{1, 0.2}, {0.4, 1}}, 5, 1));
    }

    @Test
    void bandsAreTheFifthAndNinetyFifthPercentilesOfTheFiniteDraws() {
        // Hyndman & Fan (1996) definition 7 (the default of R's quantile()): for 1, 2, ..., 21 the
        // p-quantile is 1 + 20 p, so 2 and 20.
        final double[] draws = new double[23];
        for (int i = 0; i < 21; i++) {
            draws[i] = i + 1;
        }
        draws[21] = Double.NaN;
        draws[22] = Double.POSITIVE_INFINITY;
        final FigureBand band = FigureBand.of(10, draws);
        assertEquals(2, band.low(), 1e-12);
        assertEquals(20, band.high(), 1e-12);
        assertEquals(21, band.counted());
        assertEquals(10, band.value(), 0);
    }
}
