package dev.penduline.benchmarks;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import dev.penduline.physics.swing.SwingAnalysis;
import dev.penduline.physics.swing.SwingAnalyzer;

/**
 * The decay analysis of a 300 000-sample record (5 min at 1 kHz: a still second, then a damped
 * swing with noise): release, offset, turning points, cycles, envelopes, stop. Its smoothing
 * (Savitzky–Golay) is most of the work.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class AnalysisBenchmark {

    private double[] t;
    private double[] y;
    private final SwingAnalyzer analyzer = new SwingAnalyzer();

    /** Makes the record once. */
    @Setup
    public void record() {
        int n = 300_000;
        t = new double[n];
        y = new double[n];
        SplittableRandom random = new SplittableRandom(3);
        for (int i = 0; i < n; i++) {
            t[i] = i * 1e-3;
            double s = Math.max(0, t[i] - 1);
            y[i] = Math.toRadians(20 * Math.exp(-0.01 * s) * Math.cos(2 * Math.PI * s / 1.3)) + 3e-4 * random.nextGaussian();
        }
    }

    /**
     * Analyses the record.
     *
     * @return the analysis, so the work is not optimised away
     */
    @Benchmark
    public SwingAnalysis analyse300000Samples() {
        return analyzer.analyse(t, y);
    }
}
