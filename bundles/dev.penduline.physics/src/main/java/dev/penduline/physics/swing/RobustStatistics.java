package dev.penduline.physics.swing;

import java.util.Arrays;
import java.util.Locale;

/**
 * Median and median absolute deviation (MAD), the robust location and spread used to read the
 * noise of a still segment: a single encoder step or spike moves neither.
 */
public final class RobustStatistics {

    /**
     * Scale that turns a MAD into a standard deviation for Gaussian noise, 1/Φ⁻¹(3/4)
     * (Rousseeuw &amp; Croux, J. Am. Stat. Assoc. 88 (1993) 1273).
     */
    public static final double MAD_TO_SIGMA = 1.482602218505602;

    private RobustStatistics() {
    }

    /** Median of {@code values[from, to)}; the array is not modified. */
    public static double median(double[] values, int from, int to) {
        final double[] copy = Arrays.copyOfRange(values, from, to);
        return medianInPlace(copy);
    }

    /** Median of all values, sorting the given array. */
    public static double medianInPlace(double[] values) {
        if (values.length == 0) {
            return Double.NaN;
        }
        Arrays.sort(values);
        final int h = values.length / 2;
        return values.length % 2 == 1 ? values[h] : 0.5 * (values[h - 1] + values[h]);
    }

    /** Median absolute deviation of {@code values[from, to)} about a given centre. */
    public static double mad(double[] values, int from, int to, double centre) {
        final double[] d = new double[to - from];
        for (int i = from; i < to; i++) {
            d[i - from] = Math.abs(values[i] - centre);
        }
        return medianInPlace(d);
    }

    /**
     * The step of quantised data: the smallest non-zero jump between neighbours, accepted only
     * when nearly every jump is a whole multiple of it (an encoder), else 0 (analogue noise).
     */
    public static double quantum(double[] values) {
        double smallest = Double.POSITIVE_INFINITY;
        for (int i = 1; i < values.length; i++) {
            final double d = Math.abs(values[i] - values[i - 1]);
            if (d > 0 && d < smallest) {
                smallest = d;
            }
        }
        if (!Double.isFinite(smallest)) {
            return 0;
        }
        int multiples = 0;
        int jumps = 0;
        for (int i = 1; i < values.length; i++) {
            final double r = Math.abs(values[i] - values[i - 1]) / smallest;
            if (r > 0) {
                jumps++;
                if (Math.abs(r - Math.rint(r)) < 0.02) {
                    multiples++;
                }
            }
        }
        return multiples >= 0.95 * jumps ? smallest : 0;
    }

    /**
     * An angle in radians written in degrees with four significant figures, for messages.
     *
     * @param radians the angle (rad)
     * @return e.g. {@code "12.35°"}
     */
    public static String degrees(double radians) {
        return String.format(Locale.ROOT, "%.4g°", Math.toDegrees(radians));
    }

    /**
     * The standard deviation of white noise on a smooth signal, from the MAD of its fourth
     * differences: for white noise of σ a fourth difference has variance 70·σ² (the sum of the
     * squared binomial weights 1, 4, 6, 4, 1), while a signal sampled many times per period
     * contributes only (ω·Δt)⁴ of its amplitude.
     *
     * @param y the samples
     * @return σ in the samples' unit, NaN for fewer than 10 samples
     */
    public static double highPassSigma(double[] y) {
        if (y.length < 10) {
            return Double.NaN;
        }
        final double[] d = new double[y.length - 4];
        for (int i = 0; i < d.length; i++) {
            d[i] = y[i + 4] - 4 * y[i + 3] + 6 * y[i + 2] - 4 * y[i + 1] + y[i];
        }
        return MAD_TO_SIGMA * mad(d, 0, d.length, 0) / Math.sqrt(70);
    }

    /** Median spacing of sample times. */
    public static double medianStep(double[] t) {
        if (t.length < 2) {
            return Double.NaN;
        }
        final double[] d = new double[t.length - 1];
        for (int i = 1; i < t.length; i++) {
            d[i - 1] = t[i] - t[i - 1];
        }
        return medianInPlace(d);
    }
}
