package dev.penduline.physics.swing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class SavitzkyGolayTest {

    private static double[] over(double norm, double... w) {
        final double[] out = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            out[i] = w[i] / norm;
        }
        return out;
    }

    @Test
    void fivePointQuadraticSmoothingMatchesThePublishedTable() {
        // Savitzky & Golay, Anal. Chem. 36 (1964) 1627, Table I (quadratic/cubic smoothing, 5 points):
        // (−3, 12, 17, 12, −3) / 35
        assertArrayEquals(over(35, -3, 12, 17, 12, -3), SavitzkyGolay.weights(2, 2, 0), 1e-14);
    }

    @Test
    void sevenPointQuadraticSmoothingMatchesThePublishedTable() {
        // Savitzky & Golay 1964, Table I, 7 points: (−2, 3, 6, 7, 6, 3, −2) / 21
        assertArrayEquals(over(21, -2, 3, 6, 7, 6, 3, -2), SavitzkyGolay.weights(3, 2, 0), 1e-14);
    }

    @Test
    void fivePointFirstDerivativeMatchesThePublishedTable() {
        // Savitzky & Golay 1964, Table III (quadratic first derivative, 5 points): (−2, −1, 0, 1, 2) / 10
        assertArrayEquals(over(10, -2, -1, 0, 1, 2), SavitzkyGolay.weights(2, 2, 1), 1e-14);
    }

    @Test
    void fivePointCubicFirstDerivativeMatchesThePublishedTable() {
        // Savitzky & Golay 1964, Table IV (cubic/quartic first derivative, 5 points): (1, −8, 0, 8, −1) / 12
        assertArrayEquals(over(12, 1, -8, 0, 8, -1), SavitzkyGolay.weights(2, 3, 1), 1e-13);
    }

    @Test
    void onEvenSamplesTheLocalFitIsTheConvolutionWithTheTableWeights() {
        // the convolution form of Savitzky & Golay 1964 (eq. 1) with the weights checked above against the tables
        final SplittableRandom random = new SplittableRandom(7);
        final int n = 40;
        final double h = 0.01;
        final double[] t = new double[n];
        final double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = 3 + i * h;
            y[i] = random.nextGaussian();
        }
        final double[] w = SavitzkyGolay.weights(2, 2, 1);
        final double[] d = new SavitzkyGolay(2, 2).derivative(t, y);
        for (int i = 2; i < n - 2; i++) {
            double expected = 0;
            for (int j = 0; j < 5; j++) {
                expected += w[j] * y[i - 2 + j];
            }
            assertEquals(expected / h, d[i], 1e-9, "sample " + i);
        }
    }

    @Test
    void onEvenSamplesTheConvolutionIsTheLocalLeastSquaresFitAndAnUnevenGapFallsBackToIt() {
        // the convolution (taken where a window's gaps are even) against a direct least-squares fit of
        // the same cubic in each window (LocalPolynomial), value and slope; then one gap made uneven
        final SplittableRandom random = new SplittableRandom(11);
        final int n = 200;
        final double h = 0.002;
        final double[] t = new double[n];
        final double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = 1.5 + i * h;
            y[i] = Math.sin(9 * t[i]) + 0.01 * random.nextGaussian();
        }
        t[120] += 0.3 * h;
        final SavitzkyGolay filter = new SavitzkyGolay(6, 3);
        final double[] s = filter.smooth(t, y);
        final double[] d = filter.derivative(t, y);
        final LocalPolynomial fit = new LocalPolynomial(3);
        for (int i = 6; i < n - 6; i++) {
            fit.fit(t, y, i - 6, i + 7, t[i], 6 * h);
            assertEquals(fit.value(), s[i], 1e-12, "value at sample " + i);
            assertEquals(fit.slope(), d[i], 1e-9 * Math.max(1, Math.abs(fit.slope())), "slope at sample " + i);
        }
    }

    @Test
    void aCubicFilterDifferentiatesACubicExactlyEvenOnIrregularTimes() {
        // a least-squares fit of order p reproduces any polynomial of order ≤ p exactly (Savitzky & Golay 1964,
        // the premise of the method), whatever the abscissae
        final SplittableRandom random = new SplittableRandom(11);
        final int n = 60;
        final double[] t = new double[n];
        final double[] y = new double[n];
        double time = 0;
        for (int i = 0; i < n; i++) {
            time += 0.005 + 0.01 * random.nextDouble();
            t[i] = time;
            y[i] = 0.3 - 1.2 * time + 0.8 * time * time - 2.5 * time * time * time;
        }
        final SavitzkyGolay filter = new SavitzkyGolay(4, 3);
        final double[] d = filter.derivative(t, y);
        final double[] s = filter.smooth(t, y);
        for (int i = 0; i < n; i++) {
            assertEquals(-1.2 + 1.6 * t[i] - 7.5 * t[i] * t[i], d[i], 1e-9, "slope at sample " + i);
            assertEquals(y[i], s[i], 1e-11, "value at sample " + i);
        }
    }

    @Test
    void refusesAWindowTooSmallForTheOrder() {
        assertThrows(IllegalArgumentException.class, () -> new SavitzkyGolay(1, 3));
    }
}
