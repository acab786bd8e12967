package dev.penduline.benchmarks;

import java.util.EnumSet;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.hipparchus.random.RandomGenerator;
import org.hipparchus.random.Well19937c;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionIdentifier;
import dev.penduline.physics.identify.FrictionProblem;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.ReleaseSession;
import dev.penduline.physics.identify.SessionGuess;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * What a user waits for: a viscous + Coulomb + inertia + nuisance fit of a record sampled at
 * 1 kHz, 60 s and 300 s long, from starting values 20-25 % off and a calculated inertia 2 % off.
 *
 * <p>The record is the arm of {@link SwingSimulationBenchmark} (2 kg, Lc = 0.4 m,
 * J0 = 0.5 kg·m²) released at 1 rad 1 s into the record, b = 0.01 N·m·s/rad, Tc = 0.02 N·m,
 * offset 0.02 rad, 1 mrad of white noise. In 300 s it comes to rest after about 160 s, so
 * the long record also exercises the stop. The point fit is measured without resampling
 * (what the speed targets are about) and once with the default 40 resampling refits.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class FitBenchmark {

    private FrictionProblem minute;
    private FrictionProblem fiveMinutes;
    private FrictionIdentifier point;
    private FrictionIdentifier resampled;

    /** Synthesises the records once. */
    @Setup
    public void setUp() {
        minute = problem(60);
        fiveMinutes = problem(300);
        point = new FrictionIdentifier(FitSettings.defaults().withResampling(0, 1, false));
        resampled = new FrictionIdentifier(FitSettings.defaults());
    }

    private static FrictionProblem problem(double duration) {
        final MechanismProperties arm = MechanismProperties.of(2.0, 0.4, 0.5);
        final int n = (int) Math.round(duration * 1000);
        final double release = 1.0;
        final double[] t = new double[n];
        final int first = 1000;
        final double[] tau = new double[n - first];
        for (int i = 0; i < n; i++) {
            t[i] = i / 1000.0;
        }
        for (int i = 0; i < tau.length; i++) {
            tau[i] = t[first + i] - release;
        }
        final double[] x = new SwingSimulator(arm, new FrictionTorques(0.01, 0.02, 0, 0)).withTolerance(1e-11)
                .simulate(1.0, 0, tau).angles();
        final RandomGenerator random = new Well19937c(7);
        final double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 0.02 + (i < first ? 1.0 : x[i - first]) + 1e-3 * random.nextGaussian();
        }
        final ReleaseSession session = new ReleaseSession("bench", t, y, new SessionGuess(0.97, 1.02, 0.017));
        return FrictionProblem.of(arm.withPivotInertia(0.51), List.of(session))
                .withTerms(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB))
                .withStart(new FrictionTorques(0.012, 0.015, 0, 0));
    }

    /**
     * 60 s at 1 kHz, point fit.
     *
     * @return the fit
     */
    @Benchmark
    public FrictionFit viscousCoulomb60sAt1kHz() {
        return check(point.fit(minute));
    }

    /**
     * 300 s at 1 kHz, point fit.
     *
     * @return the fit
     */
    @Benchmark
    public FrictionFit viscousCoulomb300sAt1kHz() {
        return check(point.fit(fiveMinutes));
    }

    /**
     * 60 s at 1 kHz with 40 block-bootstrap refits.
     *
     * @return the fit
     */
    @Benchmark
    public FrictionFit viscousCoulomb60sAt1kHzWithResampling() {
        return check(resampled.fit(minute));
    }

    private static FrictionFit check(FrictionFit fit) {
        if (!fit.converged()) {
            throw new IllegalStateException("benchmark fit did not converge: " + fit.message());
        }
        return fit;
    }
}
