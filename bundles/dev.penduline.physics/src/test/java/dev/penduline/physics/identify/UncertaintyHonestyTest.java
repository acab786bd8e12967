package dev.penduline.physics.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;

import org.hipparchus.distribution.continuous.NormalDistribution;
import org.hipparchus.distribution.discrete.BinomialDistribution;
import org.hipparchus.random.RandomGenerator;
import org.hipparchus.random.Well19937c;
import org.junit.jupiter.api.TestReporter;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * The σ a reported fit gives is honest in both directions: over independent realisations the
 * truth falls within ±1σ and ±2σ of the estimate as often as for a normal estimate (68.27 % and
 * 95.45 %, Abramowitz &amp; Stegun Table 26.1), neither clearly less (σ too small) nor clearly
 * more (σ too large). Acceptance: the count of covering intervals lies inside the central
 * 99 % of Binomial(N, p) (Hipparchus' binomial distribution), for each noise kind, with the
 * default σ of the report (the Jacobian's sandwich σ, or the block bootstrap's when clearly larger).
 */
class UncertaintyHonestyTest {

    private static final int REALISATIONS = 100;
    private static final double B = 0.03;
    private static final double NOISE = 2e-3;
    private static final double Q = 2 * Math.PI / 4096;

    /** The noise of the records. */
    enum Noise {
        /** White Gaussian noise. */
        WHITE,
        /** AR(1) noise with lag-1 correlation 0.8 (a filtering sensor), same marginal σ. */
        CORRELATED,
        /** A 4096-count encoder with noise of a quarter count before rounding. */
        QUANTISED
    }

    @ParameterizedTest
    @EnumSource(Noise.class)
    void reportedSigmaCoversTheTruthAsOftenAsANormalEstimate(Noise noise, TestReporter reporter) {
        final FitSettings settings = FitSettings.defaults().withResampling(40, 7, false);
        final int[][] counts = IntStream.range(0, REALISATIONS).parallel().mapToObj(r -> {
            final FrictionFit fit = new FrictionIdentifier(settings).fit(problem(noise, r));
            assertEquals(FitStatus.CONVERGED, fit.status(), noise + " realisation " + r + ": " + fit.message());
            final ParameterEstimate b = fit.parameter("b").orElseThrow();
            final double z = Math.abs(b.value() - B) / b.sigma();
            final double zj = Math.abs(b.value() - B) / b.sigmaJacobian();
            final double zr = Math.abs(b.value() - B) / b.sigmaResampling();
            return new int[] {z <= 1 ? 1 : 0, z <= 2 ? 1 : 0, zj <= 1 ? 1 : 0, zr <= 1 ? 1 : 0};
        }).toArray(int[][]::new);
        int one = 0;
        int two = 0;
        int oj = 0;
        int or = 0;
        for (int[] c : counts) {
            one += c[0];
            two += c[1];
            oj += c[2];
            or += c[3];
        }
        final double p1 = 2 * new NormalDistribution().cumulativeProbability(1) - 1;
        final double p2 = 2 * new NormalDistribution().cumulativeProbability(2) - 1;
        final int[] band1 = centralBand(p1);
        final int[] band2 = centralBand(p2);
        final String report = String.format(Locale.ROOT, "%s noise: %d of %d within ±1σ (expected %.1f, accepted"
                + " %d..%d), %d within ±2σ (expected %.1f, accepted %d..%d); within ±1σ of the Jacobian's σ alone %d, of the"
                + " bootstrap's alone %d", noise, one, REALISATIONS, REALISATIONS * p1, band1[0], band1[1], two,
                REALISATIONS * p2, band2[0], band2[1], oj, or);
        reporter.publishEntry("coverage", report);
        assertTrue(one >= band1[0] && one <= band1[1], report);
        assertTrue(two >= band2[0] && two <= band2[1], report);
    }

    /** The counts k with P(X < k) ≥ 0.5 % and P(X > k) ≥ 0.5 % for X ~ Binomial(N, p). */
    private static int[] centralBand(double p) {
        final BinomialDistribution d = new BinomialDistribution(REALISATIONS, p);
        int lo = 0;
        while (d.cumulativeProbability(lo) < 0.005) {
            lo++;
        }
        int hi = REALISATIONS;
        while (hi > 0 && 1 - d.cumulativeProbability(hi - 1) < 0.005) {
            hi--;
        }
        return new int[] {lo, hi};
    }

    private static FrictionProblem problem(Noise noise, int r) {
        // a 1 s still segment before the release, as a test rig records it
        final SyntheticRelease base = SyntheticRelease.of(FrictionTorques.viscousOnly(B));
        final SyntheticRelease truth = new SyntheticRelease(base.mechanism(), base.friction(), 0.25, 1.0,
                base.offset(), 0, 20, 100, 0, 0, 1L);
        final ReleaseSession session = switch (noise) {
            case WHITE -> truth.withNoise(NOISE, 3000 + r).session("white");
            case CORRELATED -> correlated(truth, 4000 + r);
            case QUANTISED -> truth.withNoise(0.25 * Q, 5000 + r).withCounts(4096).session("encoder");
        };
        return FrictionProblem.of(SyntheticRelease.ARM.withPivotInertia(Recovered.CALCULATED_INERTIA),
                List.of(session)).withTerms(EnumSet.of(FrictionTerm.VISCOUS))
                .withStart(FrictionTorques.viscousOnly(0.02));
    }

    /** The record with AR(1) noise e_i = φ e_(i−1) + √(1 − φ²) σ w_i, φ = 0.8 (Box & Jenkins). */
    private static ReleaseSession correlated(SyntheticRelease truth, long seed) {
        final ReleaseSession clean = truth.session("correlated");
        final double[] y = clean.angles();
        final RandomGenerator random = new Well19937c(seed);
        final double phi = 0.8;
        double e = NOISE * random.nextGaussian();
        for (int i = 0; i < y.length; i++) {
            y[i] += e;
            e = phi * e + Math.sqrt(1 - phi * phi) * NOISE * random.nextGaussian();
        }
        return clean.withAngles(y);
    }
}
