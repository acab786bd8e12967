package dev.penduline.physics.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingSimulator;

class ForecasterTest {

    /** A 2 kg arm, centroid 0.4 m below the pivot, J0 = 0.5 kg·m², hanging 0.05 rad off the sensor's zero. */
    private static final MechanismProperties ARM =
            new MechanismProperties(2.0, 0.4, 0.5, 0.05, MechanismProperties.STANDARD_GRAVITY, 0.0);
    private static final double K = ARM.gravityStiffness();
    private static final double WN = Math.sqrt(K / ARM.pivotInertia());

    @Test
    void viscousSettleTimeIsTheLastBandCrossingOfTheDampedFreeVibration() {
        // Damped free vibration from rest, x(t) = A e^(−ζωn t) (cos ωd t + ζ/√(1−ζ²) sin ωd t), with
        // its extrema at t = kπ/ωd (Thomson, Theory of Vibration with Applications, "free vibration
        // with viscous damping"); the settle time is the last time |x| = B, found here by scanning
        // the closed form, independently of the forecaster.
        final double zeta = 0.04;
        final double b = 2 * zeta * Math.sqrt(K * ARM.pivotInertia());
        final double a0 = 0.3;
        final double band = Math.toRadians(1);
        final SwingForecast f = new Forecaster(new SwingSimulator(ARM, FrictionTorques.viscousOnly(b))
                .withLinearGravity(true)).forecast(ForecastRequest.fromRest(a0, band));
        final double wd = WN * Math.sqrt(1 - zeta * zeta);
        final double expected = lastCrossing(t -> a0 * Math.exp(-zeta * WN * t)
                * (Math.cos(wd * t) + zeta / Math.sqrt(1 - zeta * zeta) * Math.sin(wd * t)), band,
                Math.log(a0 / (band * Math.sqrt(1 - zeta * zeta))) / (zeta * WN), 2 * Math.PI / wd);
        assertTrue(f.settled());
        assertEquals(expected, f.settleTime(), 1e-6);
        int extrema = 0;
        while ((extrema + 1) * Math.PI / wd < expected) {
            extrema++;
        }
        assertEquals(extrema + 1, f.halfSwings(), "the release begins the first half-swing, each extremum the next");
        // the first overshoot of a damped oscillator is A e^(−ζπ/√(1−ζ²)) (Ogata, Modern Control
        // Engineering, "maximum overshoot"); later ones are smaller
        assertEquals(a0 * Math.exp(-zeta * Math.PI / Math.sqrt(1 - zeta * zeta)), f.maxOvershoot(), 1e-8);
        // viscous friction alone holds the body nowhere but at the equilibrium
        assertEquals(0, f.restBand().width(), 0);
        // the quick envelope estimate ln(A/B)/(ζωn) lies within a half-period of the exact answer
        // (common practice)
        final double envelope = Math.log(a0 / band) / (zeta * WN);
        assertTrue(Math.abs(f.settleTime() - envelope) < Math.PI / wd, "settle " + f.settleTime() + " envelope " + envelope);
    }

    private interface Curve {
        double at(double t);
    }

    /** The last time |x(t)| = band, scanning back from a time after which |x| < band. */
    private static double lastCrossing(Curve x, double band, double after, double period) {
        final double step = period / 20000;
        double t = after;
        while (Math.abs(x.at(t)) <= band) {
            t -= step;
        }
        double lo = t;
        double hi = t + step;
        for (int i = 0; i < 200; i++) {
            final double mid = 0.5 * (lo + hi);
            if (Math.abs(x.at(mid)) > band) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Test
    void coulombHalfSwingsSettleTimeAndRestFollowTheLinearDecay() {
        // Coulomb-damped free vibration: each half-swing is a half-cosine of period 2π/ωn about a
        // centre shifted Tc/k towards its start, so the amplitude falls by 2Tc/k per half-swing
        // (4Tc/k per cycle), and the motion stops at the first reversal with |x| ≤ Tc/k (Den Hartog,
        // Mechanical Vibrations, "Coulomb damping"; Thomson, Theory of Vibration with Applications).
        final double shift = 0.006;
        final double tc = shift * K;
        final double a0 = 0.25;
        final double band = 0.05;
        final SwingForecast f = new Forecaster(new SwingSimulator(ARM, FrictionTorques.coulombOnly(tc))
                .withLinearGravity(true)).forecast(ForecastRequest.fromRest(a0, band));
        int m = 0;
        while (a0 - 2 * m * shift > band) {
            m++;
        }
        final double start = a0 - 2 * (m - 1) * shift;
        final double expectedSettle = (m - 1) * Math.PI / WN + Math.acos((band - shift) / (start - shift)) / WN;
        assertTrue(f.settled());
        assertEquals(m, f.halfSwings());
        assertEquals(expectedSettle, f.settleTime(), 1e-7);
        assertEquals(-shift, f.restBand().lower(), 1e-15);
        assertEquals(shift, f.restBand().upper(), 1e-15);
        int n = 0;
        while (a0 - 2 * n * shift > shift) {
            n++;
        }
        final double rest = (n % 2 == 0 ? 1 : -1) * (a0 - 2 * n * shift);
        assertEquals(rest, f.restAngle(), 1e-9);
        assertEquals(a0 - 2 * shift, f.maxOvershoot(), 1e-9);
        // the energy ledger: all of the release energy ½ k a0² not left as ½ k x_rest² went into the
        // Coulomb term (energy balance of a conservative spring with a dry damper)
        assertEquals(0.5 * K * (a0 * a0 - rest * rest), f.energy().coulomb(), 1e-9);
        assertEquals(0, f.energy().viscous(), 0);
    }

    @Test
    void aBandNarrowerThanTheRestBandIsNeverReached() {
        final double tc = 0.02 * K;
        final SwingForecast f = new Forecaster(new SwingSimulator(ARM, FrictionTorques.coulombOnly(tc))
                .withLinearGravity(true)).forecast(ForecastRequest.fromRest(0.31, 0.001));
        // 0.31 − 2n·0.02 first falls inside the 0.02 dead band at n = 8: x = −0.01 rad, outside ±0.001
        assertFalse(f.settled());
        assertTrue(Double.isNaN(f.settleTime()));
        assertTrue(f.note().contains("static friction holds it"), f.note());
        assertEquals(-0.01, f.restAngle(), 1e-9);
    }

    @Test
    void undampedPeakSpeedAndPassageFollowFromTheEnergyBalance() {
        // Without friction ½ J0 ω² = m g Lc (cos x − cos x0) exactly (conservation of energy), so the
        // peak |ω| is at the bottom, sqrt(2 m g Lc (1 − cos x0) / J0).
        final double x0 = 1.0;
        final double at = 0.5;
        final double radius = 0.7;
        final SwingForecast f = new Forecaster(new SwingSimulator(ARM, FrictionTorques.none()))
                .forecast(new ForecastRequest(x0, 0, Math.toRadians(2), at, radius));
        final double peak = Math.sqrt(2 * K * (1 - Math.cos(x0)) / ARM.pivotInertia());
        assertEquals(peak, f.peakAngularVelocity(), 1e-6 * peak);
        assertEquals(0, f.peakAngle(), 1e-4);
        final double omega = Math.sqrt(2 * K * (Math.cos(at) - Math.cos(x0)) / ARM.pivotInertia());
        final AnglePass pass = f.pass().orElseThrow();
        assertEquals(-omega, pass.angularVelocity(), 1e-6 * omega);
        assertEquals(omega * radius, pass.tipSpeed(), 1e-6 * omega * radius);
        assertEquals(K * (Math.cos(at) - Math.cos(x0)), pass.kineticEnergy(), 2e-6 * K * (Math.cos(at) - Math.cos(x0)));
        // a swing that never loses energy never settles, and the forecast says so
        assertFalse(f.settled());
        assertTrue(f.note().contains("still outside"), f.note());
        assertEquals(x0, f.maxOvershoot(), 1e-6);
    }

    @Test
    void aSwingThatGoesOverTheTopSettlesModuloATurn() {
        // enough speed at release to pass the upright: ½ J0 ω0² > 2 m g Lc (energy balance), so the
        // arm turns over before the Coulomb torque brings it back to swinging about the bottom
        final double omega0 = 1.3 * Math.sqrt(4 * K / ARM.pivotInertia());
        final SwingForecast f = new Forecaster(new SwingSimulator(ARM, FrictionTorques.coulombOnly(0.01 * K)))
                .forecast(new ForecastRequest(0, omega0, 0.05, Double.NaN, Double.NaN));
        assertTrue(f.settled(), f.note());
        assertTrue(f.note().contains("over the top"), f.note());
        assertTrue(Math.abs(f.restAngle()) <= f.restBand().upper() + 1e-12, "rest " + f.restAngle());
    }

    @Test
    void anAngleNeverReachedHasNoPassage() {
        final SwingForecast f = new Forecaster(new SwingSimulator(ARM, FrictionTorques.viscousOnly(0.5)))
                .forecast(new ForecastRequest(0.2, 0, 0.01, 0.3, Double.NaN));
        assertTrue(f.pass().isEmpty());
    }

    @Test
    void restBandOfStaticFrictionIsWhereGravityTorqueIsBalanced() {
        // static equilibrium: m g Lc |sin x| ≤ Ts, so |x| ≤ asin(Ts / (m g Lc)) (torque balance)
        final RestBand band = RestBand.of(ARM, 0.5 * K, false);
        assertEquals(Math.PI / 6, band.upper(), 1e-15);
        assertEquals(-Math.PI / 6, band.lower(), 1e-15);
        assertFalse(band.anywhere());
        assertTrue(RestBand.of(ARM, 1.2 * K, false).anywhere());
    }

    @Test
    void aBodyWithoutRestoringTorqueIsRefused() {
        final MechanismProperties onAxis = new MechanismProperties(2.0, 0, 0.5, 0, 9.81, 0);
        assertThrows(IllegalArgumentException.class,
                () -> new Forecaster(new SwingSimulator(onAxis, FrictionTorques.none())));
        assertThrows(IllegalArgumentException.class, () -> ForecastRequest.fromRest(0.1, 0));
    }
}
