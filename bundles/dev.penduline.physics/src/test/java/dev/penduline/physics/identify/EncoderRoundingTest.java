package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

import org.hipparchus.distribution.continuous.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestReporter;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * The encoder's rounding in the measurement model: the expected reading of a rounded Gaussian
 * against an independent summation, and a fit of coarsely quantised records without the bias of
 * plain least squares.
 */
class EncoderRoundingTest {

    private static final double Q = 2 * Math.PI / 4096;

    @Test
    void expectedReadingMatchesTheSumOverCountsOfTheNormalDistribution() {
        // Independent reference: E[round] = Σ_k k q P(count k) with P from Hipparchus'
        // NormalDistribution, summed over every count within 12 σ; the class under test uses
        // the tail-sum form and erfc below s = 0.1 steps of noise and the Fourier series above,
        // so both forms are held against it, and near the switch from either side
        for (double s : new double[] {0.03, 0.07, 0.0999, 0.1, 0.15, 0.27, 0.6, 0.99}) {
            final EncoderRounding r = new EncoderRounding(Q, 0.3 * Q, s * Q);
            final NormalDistribution normal = new NormalDistribution(0, s * Q);
            final double[] out = new double[2];
            final SplittableRandom random = new SplittableRandom(3);
            for (int i = 0; i < 200; i++) {
                final double mu = random.nextDouble(-0.5, 0.5);
                double sum = 0;
                final long centre = Math.round((mu - 0.3 * Q) / Q);
                for (long k = centre - 12; k <= centre + 12; k++) {
                    final double level = 0.3 * Q + k * Q;
                    sum += level * (normal.cumulativeProbability(level + 0.5 * Q - mu)
                            - normal.cumulativeProbability(level - 0.5 * Q - mu));
                }
                r.expected(mu, out);
                // 1e-10 q; 1e-9 q where the tail sum serves very fine noise (its terms are many
                // near-cancelling erfc values; 1.1e-10 q was seen at s = 0.03)
                assertEquals(sum, out[0], (s < EncoderRounding.FOURIER_FROM ? 1e-9 : 1e-10) * Q,
                        "g(" + mu + ") at s = " + s);
                // the slope against a central difference of the same function
                final double h = 1e-4 * Q;
                final double[] up = new double[2];
                final double[] down = new double[2];
                r.expected(mu + h, up);
                r.expected(mu - h, down);
                // (the difference's own error, h² g'''/6 ≈ (h/σ)² g'/6, is 2e-6 of g' at s = 0.03)
                assertEquals((up[0] - down[0]) / (2 * h), out[1], 1e-5 * Math.max(1, Math.abs(out[1])),
                        "g'(" + mu + ") at s = " + s);
            }
        }
        final double[] out = new double[2];
        // far from the grid the mean reading follows the angle: noise of one step or more makes
        // the rounding additive and unbiased (Widrow & Kollár, Quantization Noise, 2008, ch. 4)
        final EncoderRounding wide = new EncoderRounding(Q, 0, 1.5 * Q);
        wide.expected(0.123, out);
        assertEquals(0.123, out[0], 1e-8 * Q);
        assertEquals(1, out[1], 1e-7);
    }

    @Test
    void noiseBeforeRoundingIsFoundByMaximumLikelihood() {
        // readings of a known smooth angle, rounded after noise of σ = 0.25 q: the grouped-normal
        // likelihood recovers σ. Its standard error here is 2.2 % of σ (the spread of the estimate
        // over 200 realisations of this record, measured once by hand; unrounded readings would
        // give 1/√(2n) = 1.1 %, the rounding takes information away): within 4 of those, 9 %.
        final SplittableRandom random = new SplittableRandom(11);
        final int n = 4000;
        final double[] model = new double[n];
        final double[] y = new double[n];
        final double sigma = 0.25 * Q;
        for (int i = 0; i < n; i++) {
            model[i] = 0.2 * Math.sin(i * 0.01);
            y[i] = Q * Math.rint((model[i] + sigma * gaussian(random)) / Q);
        }
        final EncoderRounding r = EncoderRounding.of(y, model);
        assertNotNull(r);
        assertEquals(Q, r.step(), 1e-12 * Q);
        assertEquals(sigma, r.sigma(), 0.09 * sigma);
        // an analogue record (no grid) has no rounding to model
        final double[] analogue = model.clone();
        for (int i = 0; i < n; i++) {
            analogue[i] += 1e-4 * gaussian(random);
        }
        assertNull(EncoderRounding.of(analogue, model));
    }

    @Test
    void coarselyQuantisedRecordsAreFittedWithoutTheRoundingBias(TestReporter reporter) {
        // 4096 counts per revolution with sensor noise of a quarter step: the rounding error is a
        // deterministic function of the angle, and plain least squares is biased by it (the
        // condition of the quantisation theorems, Widrow & Kollár 2008, fails). Paired design:
        // each realisation's noise is fitted once unrounded and once rounded, so the difference
        // of the two estimates is the effect of the rounding alone. The records come from our own
        // simulator: this checks the estimator, not the simulator.
        final double b = 0.04;
        final int realisations = 40;
        final FitSettings settings = FitSettings.defaults().withResampling(0, 1, false);
        final double[] plain = new double[realisations];
        final double[] modelled = new double[realisations];
        for (int r = 0; r < realisations; r++) {
            final double unrounded = fitB(0, r, settings, false);
            plain[r] = fitB(4096, r, settings, false) / unrounded - 1;
            modelled[r] = fitB(4096, r, settings, true) / unrounded - 1;
        }
        final double[] p = meanAndError(plain);
        final double[] m = meanAndError(modelled);
        final String report = String.format(Locale.ROOT, "effect of the rounding on b (relative, paired with the"
                + " unrounded fit): plain least squares %.5f ± %.5f, with the rounding modelled %.5f ± %.5f", p[0],
                p[1], m[0], m[1]);
        reporter.publishEntry("encoder rounding", report);
        // the plain fit is biased far beyond the scatter of the mean (so this test can fail), the
        // modelled fit is not: within three standard errors of zero
        assertTrue(Math.abs(p[0]) > 6 * p[1], report);
        assertTrue(Math.abs(m[0]) < 3 * m[1], report);
        assertTrue(Math.abs(m[0]) < 0.25 * Math.abs(p[0]), report);
    }

    /** b fitted to one realisation: rounded to the given counts (0: not), with or without the rounding model. */
    private static double fitB(int counts, int realisation, FitSettings settings, boolean model) {
        final SyntheticRelease truth = SyntheticRelease.of(FrictionTorques.viscousOnly(0.04)).withTheta0(0.2)
                .withDuration(12, 200).withNoise(0.25 * Q, 500 + realisation).withCounts(counts);
        final FrictionProblem problem = FrictionProblem.of(SyntheticRelease.ARM, List.of(truth.session("encoder")))
                .withTerms(EnumSet.of(FrictionTerm.VISCOUS)).withStart(FrictionTorques.viscousOnly(0.03));
        PointFit point = StagedFit.run(problem, problem.terms(), settings, FitControl.none());
        if (model) {
            point = FrictionIdentifier.withEncoderRounding(problem, point, settings, FitControl.none());
            assertNotNull(point.data().get(0).rounding(), "the rounding is modelled");
        }
        return point.outcome().full()[ParameterLayout.index(ParameterKind.VISCOUS)];
    }

    private static double[] meanAndError(double[] d) {
        double mean = 0;
        for (double v : d) {
            mean += v;
        }
        mean /= d.length;
        double sum = 0;
        for (double v : d) {
            sum += (v - mean) * (v - mean);
        }
        return new double[] {mean, Math.sqrt(sum / (d.length - 1) / d.length)};
    }

    @Test
    void theReportedFitNamesTheModelledRounding() {
        final SyntheticRelease truth = SyntheticRelease.of(FrictionTorques.viscousOnly(0.04)).withTheta0(0.2)
                .withDuration(12, 200).withNoise(0.25 * Q, 77).withCounts(4096);
        final FrictionFit fit = new FrictionIdentifier(FitSettings.defaults().withResampling(0, 1, false))
                .fit(FrictionProblem.of(SyntheticRelease.ARM, List.of(truth.session("encoder")))
                        .withTerms(EnumSet.of(FrictionTerm.VISCOUS)).withStart(FrictionTorques.viscousOnly(0.03)));
        assertTrue(fit.hasWarning(FitWarning.Kind.ENCODER_ROUNDING), fit.warnings().toString());
        assertEquals(FitStatus.CONVERGED, fit.status(), fit.message());
    }

    private static double gaussian(SplittableRandom random) {
        // Box–Muller (Box & Muller, Ann. Math. Stat. 29, 1958)
        return Math.sqrt(-2 * Math.log(1 - random.nextDouble())) * Math.cos(2 * Math.PI * random.nextDouble());
    }
}
