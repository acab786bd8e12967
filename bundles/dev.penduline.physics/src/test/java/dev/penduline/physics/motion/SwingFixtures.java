package dev.penduline.physics.motion;

import java.util.List;

import dev.penduline.physics.MechanismProperties;

/**
 * Named reference mechanisms shared by the motion tests.
 */
final class SwingFixtures {

    /**
     * A 2 kg arm, centroid 0.4 m below the pivot, J0 = 0.5 kg·m², hanging 0.05 rad off the
     * sensor's zero: K = m g Lc = 7.84532 N·m/rad, ωn ≈ 3.961 rad/s, T0 ≈ 1.586 s.
     */
    static final MechanismProperties ARM =
            new MechanismProperties(2.0, 0.4, 0.5, 0.05, MechanismProperties.STANDARD_GRAVITY, 0.0);

    private SwingFixtures() {
    }

    /** Small-angle period 2π sqrt(J0 / (m g Lc)) (s). */
    static double smallAnglePeriod(MechanismProperties p) {
        return 2 * Math.PI * Math.sqrt(p.pivotInertia() / p.gravityStiffness());
    }

    /** Sample times spread irregularly over [0, duration], to exercise the dense output. */
    static double[] irregularTimes(double duration, int count) {
        final double[] t = new double[count];
        for (int i = 0; i < count; i++) {
            // jitter below half a spacing keeps the times increasing
            t[i] = duration * (i + 0.45 * Math.sin(37.0 * i)) / (count - 1);
        }
        t[0] = 0;
        t[count - 1] = duration;
        return t;
    }

    /** Deviation of each turning point from θeq (rad). */
    static double[] deviations(List<TurningPoint> points, MechanismProperties p) {
        final double[] x = new double[points.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = points.get(i).angle() - p.equilibriumAngle();
        }
        return x;
    }
}
