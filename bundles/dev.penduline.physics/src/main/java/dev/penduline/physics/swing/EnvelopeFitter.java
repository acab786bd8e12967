package dev.penduline.physics.swing;

import java.util.List;

/**
 * Fits the three envelope shapes by straight lines in their linearising coordinates (A, ln A,
 * 1/A against the half-swing count) and scores each by r² in amplitude space.
 */
final class EnvelopeFitter {

    private EnvelopeFitter() {
    }

    static List<DecayEnvelope> fit(double[] amplitudes) {
        final int n = amplitudes.length;
        if (n < 3) {
            return List.of();
        }
        final double[] x = new double[n];
        final double[] y = new double[n];
        final double[] model = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i;
        }
        // linear: A = A0 − d n
        StraightLine line = StraightLine.fit(x, amplitudes, n);
        for (int i = 0; i < n; i++) {
            model[i] = line.intercept() + line.slope() * i;
        }
        final DecayEnvelope linear = new DecayEnvelope(DecayEnvelope.Model.LINEAR, line.intercept(),
                -2 * line.slope(), StraightLine.rSquared(amplitudes, model, n), n);
        // geometric: ln A = ln A0 − λ n
        for (int i = 0; i < n; i++) {
            y[i] = Math.log(amplitudes[i]);
        }
        line = StraightLine.fit(x, y, n);
        for (int i = 0; i < n; i++) {
            model[i] = Math.exp(line.intercept() + line.slope() * i);
        }
        final DecayEnvelope geometric = new DecayEnvelope(DecayEnvelope.Model.GEOMETRIC, Math.exp(line.intercept()),
                -2 * line.slope(), StraightLine.rSquared(amplitudes, model, n), n);
        // reciprocal: 1/A = 1/A0 + μ n
        for (int i = 0; i < n; i++) {
            y[i] = 1 / amplitudes[i];
        }
        line = StraightLine.fit(x, y, n);
        for (int i = 0; i < n; i++) {
            model[i] = 1 / (line.intercept() + line.slope() * i);
        }
        final DecayEnvelope reciprocal = new DecayEnvelope(DecayEnvelope.Model.RECIPROCAL, 1 / line.intercept(),
                2 * line.slope(), StraightLine.rSquared(amplitudes, model, n), n);
        return List.of(linear, geometric, reciprocal);
    }
}
