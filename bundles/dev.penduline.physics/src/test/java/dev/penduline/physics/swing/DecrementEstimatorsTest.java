package dev.penduline.physics.swing;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * The envelope and regression estimators on clean small-angle decays (linearised gravity), against
 * the classic closed forms.
 */
class DecrementEstimatorsTest {

    private static final MechanismProperties ARM = SyntheticSwingRecord.ARM;
    private static final double K = ARM.gravityStiffness();

    private static SwingAnalysis analyse(FrictionTorques friction, double theta0, double duration, boolean linear) {
        final SwingRun run = new SwingSimulator(ARM, friction).withLinearGravity(linear).withTolerance(1e-11)
                .simulate(ARM.equilibriumAngle() + theta0, 0, duration, 400);
        // a still second before the release, sampled on the same grid
        final int still = 400;
        final double[] t = new double[still + run.size()];
        final double[] theta = new double[t.length];
        final double[] runTimes = run.times();
        final double[] runAngles = run.angles();
        for (int i = 0; i < still; i++) {
            t[i] = (i - still) / 400.0;
            theta[i] = runAngles[0];
        }
        for (int i = 0; i < run.size(); i++) {
            t[still + i] = runTimes[i];
            theta[still + i] = runAngles[i];
        }
        return new SwingAnalyzer().withMechanism(ARM).analyse(t, theta);
    }

    @Test
    void logarithmicDecrementOfAViscousDecay() {
        final double zeta = 0.02;
        final double b = 2 * zeta * Math.sqrt(K * ARM.pivotInertia());
        final SwingAnalysis a = analyse(FrictionTorques.viscousOnly(b), Math.toRadians(10), 30, true);
        final DecayEnvelope geometric = a.envelope(DecayEnvelope.Model.GEOMETRIC).orElseThrow();
        final double delta = 2 * Math.PI * zeta / Math.sqrt(1 - zeta * zeta);
        // Thomson, Theory of Vibration with Applications, §2.6: δ = 2πζ / sqrt(1 − ζ²)
        assertEquals(delta, geometric.ratePerCycle(), 1e-4 * delta);
        // and its inverse ζ = δ / sqrt(4π² + δ²), same source
        assertEquals(zeta, geometric.dampingRatio(), 1e-4 * zeta);
        assertEquals(1, geometric.rSquared(), 1e-6);
        // a constant ratio e^(−δ/2) per half-swing (Thomson, same section) gives ΔA = 2 Ā tanh(δ/4) about the
        // mean amplitude Ā; the regression, fitted to the energy-equivalent decrement, follows it to the
        // sin(Ā)/Ā of that correction (≤ 0.5 % at 10°)
        final DecrementRegression r = a.regression().orElseThrow();
        for (double amp : new double[] {0.05, 0.1, 0.15}) {
            assertEquals(2 * amp * Math.tanh(delta / 4), r.decrement(amp), 0.01 * 2 * amp * Math.tanh(delta / 4));
        }
        // energy balance per half-swing (DecrementRegression): a1 = π b ωn / (2K), so b = 2 K a1 / (π ωn)
        assertEquals(b, a.estimates().orElseThrow().viscous(), 0.03 * b);
        assertEquals(LossVerdict.Loss.VISCOUS, a.verdict().kind());
        assertEquals(DecayEnvelope.Model.GEOMETRIC, a.verdict().bestEnvelope());
    }

    @Test
    void coulombDecrementPerCycleIsFourTcOverK() {
        final double tc = 0.02;
        final SwingAnalysis a = analyse(FrictionTorques.coulombOnly(tc), Math.toRadians(12), 40, true);
        final DecayEnvelope linear = a.envelope(DecayEnvelope.Model.LINEAR).orElseThrow();
        // Den Hartog, Mechanical Vibrations, "Coulomb damping": the amplitude falls by 4 Tc / k per cycle
        assertEquals(4 * tc / K, linear.ratePerCycle(), 1e-4 * 4 * tc / K);
        assertEquals(1, linear.rSquared(), 1e-6);
        assertEquals(LossVerdict.Loss.COULOMB, a.verdict().kind());
        assertEquals(DecayEnvelope.Model.LINEAR, a.verdict().bestEnvelope());
    }

    @Test
    void coulombRegressionGivesTcAtLargeAmplitudeToo() {
        final double tc = 0.02;
        // full gravity from 30°: the work of Coulomb friction over a half-swing, Tc (A1 + A2), equals the
        // potential lost, K (cos A2 − cos A1) (energy balance), so the energy-equivalent decrement
        // is 2 Tc / K exactly at any amplitude (Den Hartog's 2 Tc / k per half-swing at small ones)
        final SwingAnalysis a = analyse(FrictionTorques.coulombOnly(tc), Math.toRadians(30), 40, false);
        final DecrementRegression r = a.regression().orElseThrow();
        assertEquals(2 * tc / K, r.a0(), 1e-3 * 2 * tc / K);
        assertEquals(tc, a.estimates().orElseThrow().coulomb(), 1e-3 * tc);
        assertEquals(LossVerdict.Loss.COULOMB, a.verdict().kind());
    }

    @Test
    void coulombStopGivesTheStictionBound() {
        final double tc = 0.03;
        final double ts = 0.06;
        final SwingAnalysis a = analyse(new FrictionTorques(0, tc, ts, 0), Math.toRadians(8), 20, true);
        final SwingRun truth = new SwingSimulator(ARM, new FrictionTorques(0, tc, ts, 0)).withLinearGravity(true)
                .simulate(ARM.equilibriumAngle() + Math.toRadians(8), 0, 20, 400);
        final StopInfo stop = a.stop();
        assertEquals(true, stop.stopped());
        assertEquals(truth.restAngle(), stop.restAngle(), 1e-9);
        // noise-free and linear: the last cycle is two exact cosines, so the stop comes out within a few samples
        // (self-consistency with the simulator that made the record)
        assertEquals(truth.stopTime(), stop.time(), 5 / 400.0);
        // held by stiction the body rests within ±asin(Ts/K) of the equilibrium, so K|sin x| ≤ Ts, and Coulomb's dead band
        // (Den Hartog) puts the last reversal within Ts/K
        final double x = truth.restAngle() - ARM.equilibriumAngle();
        assertEquals(K * Math.abs(Math.sin(x)), stop.stictionLowerBound(), 1e-3 * K * Math.abs(x));
        assertEquals(true, stop.stictionLowerBound() <= ts);
    }
}
