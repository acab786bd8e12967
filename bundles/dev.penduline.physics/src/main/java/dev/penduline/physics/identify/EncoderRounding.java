package dev.penduline.physics.identify;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;
import org.hipparchus.special.Erf;

import dev.penduline.physics.swing.RobustStatistics;

/**
 * The rounding of an encoder, put into the measurement model so that a record whose noise is
 * small against one count is fitted without the rounding bias.
 *
 * <p>An encoder reports {@code y = Q(μ + ε)}: the true angle μ plus sensor noise ε ~ N(0, σ²),
 * rounded to the nearest count of the grid {@code phase + k q}. When σ is a good fraction of q
 * the rounding error is uniform and independent of μ, and fitting μ to y is unbiased (Widrow
 * &amp; Kollár, Quantization Noise, Cambridge 2008, ch. 4–5: the quantisation theorems); when σ
 * is small against q it is a deterministic, signal-dependent error, and least squares on μ is
 * biased. The expected reading, however, is known exactly for Gaussian noise:
 *
 * <pre>  E[y | μ] = g(μ) = phase + q Σ_k k [Φ((k + ½ − u)/s) − Φ((k − ½ − u)/s)],  u = (μ − phase)/q, s = σ/q</pre>
 *
 * with Φ the normal distribution function, and {@code g'(μ) = (1/s) Σ_k φ((k − ½ − u)/s)} (by
 * summation by parts). Fitting y to g(μ) instead of μ is then an unbiased moment estimator,
 * least squares on the correct mean function (quasi-likelihood: Wedderburn, Biometrika 61,
 * 1974); the sensitivities of μ carry over by the chain rule. σ is not known from a still
 * segment that shows a single count: it is estimated by maximum likelihood of the rounded
 * readings given the fitted μ, the grouped-normal likelihood
 * {@code Σ ln[Φ((y_i + q/2 − μ_i)/σ) − Φ((y_i − q/2 − μ_i)/σ)]}, maximised over σ by Brent's
 * method (Hipparchus' {@link BrentOptimizer}).
 *
 * <p>Evaluation. For s ≥ {@value #FOURIER_FROM} the mean function is summed as its Fourier
 * series instead: the rounding error {@code round(x) − x} is the sawtooth
 * {@code Σ_{m≥1} (−1)^m sin(2πmx)/(πm)}, and Gaussian noise multiplies each harmonic by its
 * characteristic function {@code exp(−2π²m²s²)} (the quantisation theorems' own tool: Widrow
 * &amp; Kollár, ch. 4, from memory), so
 * {@code g = phase + q [u + Σ (−1)^m e^{−2π²m²s²} sin(2πmu)/(πm)]} and
 * {@code g' = 1 + 2 Σ (−1)^m e^{−2π²m²s²} cos(2πmu)}. The factors fall off as e^{−m²}, so a few
 * harmonics reach double precision (9 at s = 0.15, 5 at s = 0.27), one sine and one cosine per
 * reading (the harmonics by the angle-addition recurrence) against several erfc evaluations of
 * the tail sum; below s = {@value #FOURIER_FROM} the harmonics decay slowly and the tail sum,
 * which then has few terms, is used.
 *
 * <p>Immutable.
 */
final class EncoderRounding {

    /** Noise in steps from which on the Fourier series is summed. */
    static final double FOURIER_FROM = 0.1;
    /** Harmonics are summed until their factor falls below this. */
    private static final double HARMONIC_FLOOR = 1e-17;

    /** Ratio σ/q from which on the rounding is treated as plain noise (the bias is below 1e-8 of q). */
    static final double PLAIN_NOISE_RATIO = 1.0;
    /** Normal tails beyond this many σ are ignored. */
    private static final double TAIL = 7;
    private static final double SQRT_2 = Math.sqrt(2);
    private static final double INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);

    private final double step;
    private final double phase;
    private final double sigma;
    /** (−1)^m e^{−2π²m²s²} for m = 1.. (empty below {@link #FOURIER_FROM}). */
    private final double[] harmonics;

    /**
     * A rounding model.
     *
     * @param step  the encoder step q (rad), &gt; 0
     * @param phase where the grid lies: readings are phase + k q (rad)
     * @param sigma the sensor noise σ before rounding (rad), &gt; 0
     */
    EncoderRounding(double step, double phase, double sigma) {
        this.step = step;
        this.phase = phase;
        this.sigma = sigma;
        final double s = sigma / step;
        if (s >= FOURIER_FROM) {
            final double rate = 2 * Math.PI * Math.PI * s * s;
            final int count = (int) Math.ceil(Math.sqrt(-Math.log(HARMONIC_FLOOR) / rate));
            harmonics = new double[count];
            for (int m = 1; m <= count; m++) {
                harmonics[m - 1] = (m % 2 == 0 ? 1 : -1) * Math.exp(-rate * m * m);
            }
        } else {
            harmonics = new double[0];
        }
    }

    /** The encoder step q (rad). */
    double step() {
        return step;
    }

    /** Where the grid lies: readings are phase + k q (rad). */
    double phase() {
        return phase;
    }

    /** The sensor noise σ before rounding (rad). */
    double sigma() {
        return sigma;
    }

    /**
     * The rounding of a session, when the record is quantised coarsely for its noise.
     *
     * @param angles the recorded angles (rad)
     * @param model  the fitted model at every sample (rad), same length
     * @return the rounding model, or null when the record is not quantised or its noise is at
     *         least {@link #PLAIN_NOISE_RATIO} steps
     */
    static EncoderRounding of(double[] angles, double[] model) {
        final double q = RobustStatistics.quantum(angles);
        if (!(q > 0)) {
            return null;
        }
        final double phase = angles[0] - q * Math.rint(angles[0] / q);
        final UnivariateFunction logLikelihood = s -> {
            double sum = 0;
            for (int i = 0; i < angles.length; i++) {
                final double hi = (angles[i] + 0.5 * q - model[i]) / s;
                final double lo = (angles[i] - 0.5 * q - model[i]) / s;
                sum += Math.log(Math.max(1e-300, probability(lo, hi)));
            }
            return sum;
        };
        final double best = new BrentOptimizer(1e-6, 1e-9 * q).optimize(new MaxEval(200),
                new UnivariateObjectiveFunction(logLikelihood), GoalType.MAXIMIZE,
                new SearchInterval(0.01 * q, 3 * q)).getPoint();
        if (best >= PLAIN_NOISE_RATIO * q) {
            return null;
        }
        return new EncoderRounding(q, phase, best);
    }

    /**
     * The same grid with another noise σ.
     *
     * @param newSigma noise before rounding (rad), &gt; 0
     * @return the copy
     */
    EncoderRounding withSigma(double newSigma) {
        return new EncoderRounding(step, phase, newSigma);
    }

    /** Φ(hi) − Φ(lo), computed from the tail nearer zero for accuracy. */
    private static double probability(double lo, double hi) {
        if (lo > 0) {
            return 0.5 * (Erf.erfc(lo / SQRT_2) - Erf.erfc(hi / SQRT_2));
        }
        if (hi < 0) {
            return 0.5 * (Erf.erfc(-hi / SQRT_2) - Erf.erfc(-lo / SQRT_2));
        }
        return 0.5 * (Erf.erf(hi / SQRT_2) - Erf.erf(lo / SQRT_2));
    }

    /**
     * The expected reading and its derivative at a true angle.
     *
     * <p>With u = n + f (n the nearest count, |f| ≤ ½) and p_k = P(f + e &gt; k − ½):
     * {@code E[round(f + e)] = Σ_{k ≥ 1} p_k − Σ_{k ≤ 0} (1 − p_k)}, the mean of an integer
     * variable from its tail probabilities. Terms whose threshold lies beyond {@value #TAIL}
     * standard deviations are 0 on either side, so the sum is finite.
     *
     * @param mu  the true angle (rad)
     * @param out {g(μ), g'(μ)} on return
     */
    void expected(double mu, double[] out) {
        final double u = (mu - phase) / step;
        if (harmonics.length > 0) {
            final double n = Math.rint(u);
            final double f = u - n;
            final double angle = 2 * Math.PI * f;
            final double sin1 = Math.sin(angle);
            final double cos1 = Math.cos(angle);
            double sin = sin1;
            double cos = cos1;
            double value = 0;
            double slope = 0;
            for (int m = 1; m <= harmonics.length; m++) {
                value += harmonics[m - 1] * sin / (Math.PI * m);
                slope += harmonics[m - 1] * cos;
                final double nextSin = sin * cos1 + cos * sin1;
                cos = cos * cos1 - sin * sin1;
                sin = nextSin;
            }
            out[0] = phase + step * (n + f + value);
            out[1] = 1 + 2 * slope;
            return;
        }
        final double n = Math.rint(u);
        final double f = u - n;
        final double s = sigma / step;
        final int reach = (int) Math.ceil(TAIL * s) + 1;
        double value = 0;
        double slope = 0;
        for (int k = -reach; k <= reach + 1; k++) {
            final double z = (k - 0.5 - f) / s;
            if (Math.abs(z) > TAIL) {
                continue;
            }
            final double p = 0.5 * Erf.erfc(z / SQRT_2);
            value += k >= 1 ? p : p - 1;
            slope += INV_SQRT_2PI * Math.exp(-0.5 * z * z) / s;
        }
        out[0] = phase + step * (n + value);
        out[1] = slope;
    }
}
