package dev.penduline.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * What identification pays per model evaluation: a 60 s free decay sampled at 1 kHz, with
 * viscous and Coulomb friction so that every half-swing ends in a reversal event.
 *
 * <p>The arm (2 kg, Lc = 0.4 m, J0 = 0.5 kg·m², T0 ≈ 1.59 s) is released at 1 rad; with
 * b = 0.01 N·m·s/rad and Tc = 0.02 N·m it makes about 75 reversals in the minute without
 * stopping, which is the expensive case.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class SwingSimulationBenchmark {

    private SwingSimulator simulator;
    private SwingSimulator relaxed;

    /** Builds the simulators once; each invocation is one full run. */
    @Setup
    public void setUp() {
        final MechanismProperties arm = MechanismProperties.of(2.0, 0.4, 0.5);
        simulator = new SwingSimulator(arm, new FrictionTorques(0.01, 0.02, 0, 0));
        relaxed = simulator.withTolerance(1e-8);
    }

    /**
     * 60 s at 1 kHz, default tolerance (1e-10).
     *
     * @return the run (returned so the JIT cannot drop the work)
     */
    @Benchmark
    public SwingRun viscousCoulomb60sAt1kHz() {
        return simulator.simulate(1.0, 0, 60, 1000);
    }

    /**
     * The same run at the looser tolerance a fit can afford (1e-8).
     *
     * @return the run
     */
    @Benchmark
    public SwingRun viscousCoulomb60sAt1kHzTolerance1e8() {
        return relaxed.simulate(1.0, 0, 60, 1000);
    }
}
