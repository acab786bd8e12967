package dev.penduline.physics.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import dev.penduline.physics.MechanismProperties;

class UndampedSwingTest {

    private static final MechanismProperties ARM = SwingFixtures.ARM;

    @Test
    void smallSwingHasTheTextbookPeriod() {
        // Compound pendulum, small amplitude: T0 = 2π sqrt(J0 / (m g Lc))
        // (Den Hartog, Mechanical Vibrations, compound pendulum; Thomson, Theory of Vibration
        // with Applications). The large-amplitude correction at 1e-4 rad is θ0²/16 ≈ 6e-10.
        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.none())
                .simulate(ARM.equilibriumAngle() + 1e-4, 0, 20, 100);
        final double expected = 2 * Math.PI * Math.sqrt(0.5 / (2.0 * 9.80665 * 0.4));
        final double[] periods = run.periods();
        assertTrue(periods.length >= 20, "expected many cycles, got " + periods.length);
        for (double period : periods) {
            assertEquals(expected, period, 2e-9 * expected);
        }
        for (double half : run.halfSwingDurations()) {
            assertEquals(expected / 2, half, 2e-9 * expected);
        }
        assertFalse(run.stopped());
        assertTrue(Double.isNaN(run.stopTime()));
    }

    @Test
    void linearisedGravityGivesTheSmallAnglePeriodAtAnyAmplitude() {
        // Linear oscillator J0 x'' + K x = 0: period 2π sqrt(J0/K) independent of amplitude
        // (Thomson, Theory of Vibration with Applications, undamped free vibration).
        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.none()).withLinearGravity(true)
                .simulate(ARM.equilibriumAngle() + 1.2, 0, 10, 10);
        for (double period : run.periods()) {
            assertEquals(SwingFixtures.smallAnglePeriod(ARM), period, 1e-9);
        }
    }

    @ParameterizedTest(name = "amplitude {0}°")
    @CsvSource({
        // amplitude (deg), K at modular angle amplitude/2 from Abramowitz & Stegun Table 17.1
        // (K(α) against the modular angle α, m = sin²α), values from memory, 10 decimals
        "30, 1.5981420021",
        "90, 1.8540746773",
        "150, 2.7680631454",
        "170, 3.8317419998"})
    void largeSwingPeriodFollowsTheEllipticIntegral(double amplitudeDegrees, double tabulatedK) {
        final double amplitude = Math.toRadians(amplitudeDegrees);
        final double m = Math.pow(Math.sin(amplitude / 2), 2);
        final double bigK = LegendreEllipticIntegral.bigK(m);
        // the closed form against the table, to the table's 10 decimals
        assertEquals(tabulatedK, bigK, 6e-11);
        // independent check of the table value by Gauss' arithmetic-geometric mean,
        // K = π / (2 AGM(1, cos α)) (Abramowitz & Stegun 17.6, the AGM process)
        assertEquals(tabulatedK, Math.PI / (2 * arithmeticGeometricMean(1, Math.cos(amplitude / 2))), 6e-11);

        final double t0 = SwingFixtures.smallAnglePeriod(ARM);
        // T = 4 sqrt(J0 / (m g Lc)) K(sin(θ0/2)) (classic pendulum result; A&S ch. 17)
        final double expected = 4 * Math.sqrt(ARM.pivotInertia() / ARM.gravityStiffness()) * bigK;
        final EllipticSwing closedForm = new EllipticSwing(ARM, ARM.equilibriumAngle() + amplitude);
        assertEquals(expected, closedForm.period(), 1e-14 * expected);
        assertEquals(2 * tabulatedK / Math.PI, closedForm.periodRatio(), 5e-11);

        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.none())
                .simulate(ARM.equilibriumAngle() + amplitude, 0, 4 * expected, 50);
        final double[] periods = run.periods();
        assertTrue(periods.length >= 6);
        for (double period : periods) {
            assertEquals(expected, period, 1e-8 * expected);
        }
        // the ratio T/T0 = 2K/π that the table gives
        assertEquals(2 * tabulatedK / Math.PI, periods[0] / t0, 1e-8);
        // every turning point reaches the release amplitude again (undamped)
        for (TurningPoint p : run.turningPoints()) {
            assertEquals(amplitude, Math.abs(p.angle() - ARM.equilibriumAngle()), 1e-8);
        }
    }

    @Test
    void largeSwingTrajectoryFollowsJacobiSn() {
        // θ − θeq = 2 asin(k sn(K − ωn t, k)), k = sin(θ0/2): the classic exact pendulum
        // solution, evaluated with Hipparchus' Jacobi functions (an independent library).
        final double theta0 = ARM.equilibriumAngle() - Math.toRadians(150);
        final EllipticSwing exact = new EllipticSwing(ARM, theta0);
        final double[] times = SwingFixtures.irregularTimes(3 * exact.period(), 2001);
        // the phase error of any integrator grows with time: a tight tolerance keeps three
        // periods of a 150° swing within 1e-9 rad (at 1e-10 it is about 4e-8 rad)
        final SwingRun run = new SwingSimulator(ARM, FrictionTorques.none()).withTolerance(1e-12)
                .simulate(theta0, 0, times);
        final double[] angles = run.angles();
        final double[] velocities = run.velocities();
        final double peakRate = 2 * exact.modulus() * ARM.naturalFrequency();
        for (int i = 0; i < times.length; i++) {
            assertEquals(exact.angle(times[i]), angles[i], 1e-9, "angle at t = " + times[i]);
            assertEquals(exact.velocity(times[i]), velocities[i], 1e-9 * peakRate, "ω at t = " + times[i]);
        }
        // energy conserved to the integrator's tolerance
        assertEquals(0, run.energy().imbalance(), 1e-11 * run.energy().initial());
    }

    private static double arithmeticGeometricMean(double a, double b) {
        double x = a;
        double y = b;
        // converges quadratically: 8 rounds reach machine precision for any cos α ≥ 0.05
        for (int i = 0; i < 8; i++) {
            final double mean = 0.5 * (x + y);
            y = Math.sqrt(x * y);
            x = mean;
        }
        return x;
    }
}
