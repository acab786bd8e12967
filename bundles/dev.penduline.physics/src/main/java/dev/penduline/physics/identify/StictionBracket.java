package dev.penduline.physics.identify;

import java.util.Arrays;
import java.util.List;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;
import dev.penduline.physics.motion.TurningPoint;

/**
 * Brackets the static torque Ts from where the records stop.
 *
 * <p>Stiction enters the model only through the stick test at a reversal (the body stays
 * when {@code K |sin x| ≤ Ts}), so the trajectory is piecewise constant in Ts and its
 * gradient is zero almost everywhere: Levenberg–Marquardt cannot move it. Instead, with the
 * other parameters fixed, stopping at reversal k needs {@code K |sin x_k| ≤ Ts} and swinging on
 * at every earlier one needs {@code Ts < K |sin x_j|}, j &lt; k. One run without extra stiction
 * gives every x_k, and the cost of stopping at each k follows from running sums (the samples
 * after the stop are compared with the constant x_k), so the best stop and its Ts interval
 * come from one simulation. Sessions are joined by intersecting their intervals.
 */
final class StictionBracket {

    private StictionBracket() {
    }

    /** The joint band of Ts (N·m) at the full parameter vector. */
    static StictionBand of(MechanismProperties level, double[] full, List<StageSamples> data, double tolerance) {
        final double b = full[ParameterLayout.index(ParameterKind.VISCOUS)];
        final double tc = full[ParameterLayout.index(ParameterKind.COULOMB)];
        final double c = full[ParameterLayout.index(ParameterKind.DRAG)];
        final MechanismProperties mechanism = level.withPivotInertia(full[ParameterLayout.index(ParameterKind.INERTIA)]);
        final SwingSimulator simulator = new SwingSimulator(mechanism, new FrictionTorques(b, tc, 0, c))
                .withTolerance(tolerance);
        double lower = tc;
        double upper = Double.POSITIVE_INFINITY;
        for (int s = 0; s < data.size(); s++) {
            final double[] band = session(simulator, mechanism.gravityStiffness(), tc,
                    full[ParameterLayout.index(s, ParameterKind.RELEASE_ANGLE)], full[ParameterLayout.index(s, ParameterKind.RELEASE_TIME)],
                    full[ParameterLayout.index(s, ParameterKind.OFFSET)], data.get(s));
            lower = Math.max(lower, band[0]);
            upper = Math.min(upper, band[1]);
        }
        if (lower < upper) {
            return new StictionBand(lower, upper, true);
        }
        return new StictionBand(lower, lower, false);
    }

    private static double[] session(SwingSimulator simulator, double k, double tc, double theta0, double release,
            double offset, StageSamples samples) {
        final double[] t = samples.times();
        final double[] y = samples.angles();
        final int n = t.length;
        int first = 0;
        while (first < n && t[first] - release <= 0) {
            first++;
        }
        final double[] model = new double[n];
        Arrays.fill(model, 0, first, theta0);
        List<TurningPoint> points = List.of(new TurningPoint(0, theta0));
        boolean stops = true;
        if (first < n) {
            final double[] tau = new double[n - first];
            for (int i = 0; i < tau.length; i++) {
                tau[i] = t[first + i] - release;
            }
            final SwingRun run = simulator.simulate(theta0, 0, tau);
            System.arraycopy(run.angles(), 0, model, first, tau.length);
            points = run.turningPoints();
            stops = run.stopped();
        }
        // running sums: squared misfit before i, and Σz, Σz² from i on, with z = y − offset
        final double[] before = new double[n + 1];
        final double[] sum = new double[n + 1];
        final double[] sumSquares = new double[n + 1];
        for (int i = 0; i < n; i++) {
            final double r = y[i] - offset - model[i];
            before[i + 1] = before[i] + r * r;
        }
        for (int i = n - 1; i >= 0; i--) {
            final double z = y[i] - offset;
            sum[i] = sum[i + 1] + z;
            sumSquares[i] = sumSquares[i + 1] + z * z;
        }
        double bestCost = stops ? Double.POSITIVE_INFINITY : before[n];
        double running = k * Math.abs(Math.sin(points.get(0).angle()));
        double[] best = {tc, running};
        int sample = first;
        for (int j = 1; j < points.size(); j++) {
            final TurningPoint p = points.get(j);
            final double holding = k * Math.abs(Math.sin(p.angle()));
            while (sample < n && t[sample] - release < p.time()) {
                sample++;
            }
            final double lo = Math.max(tc, holding);
            if (lo < running) {
                final double x = p.angle();
                final double cost = before[sample] + sumSquares[sample] - 2 * x * sum[sample] + (n - sample) * x * x;
                if (cost < bestCost) {
                    bestCost = cost;
                    best = new double[] {lo, running};
                }
            }
            running = Math.min(running, holding);
        }
        if (!stops && before[n] <= bestCost) {
            best = new double[] {tc, running};
        }
        return best;
    }
}
