package dev.penduline.physics.identify;

import java.util.List;
import java.util.function.BooleanSupplier;

import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

import dev.penduline.physics.motion.SwingCompanion;
import dev.penduline.physics.motion.SwingEquation;
import dev.penduline.physics.motion.SwingIntegration;
import dev.penduline.physics.motion.SwingSampler;
import dev.penduline.physics.motion.TurningPoint;

/**
 * A release from rest integrated together with its sensitivity (variational) equations.
 *
 * <p>The motion is the simulator's: the same {@link SwingEquation} (here in deviation
 * coordinates x = θ − θeq), integrated by the same {@link SwingIntegration}, with the same
 * reversal event and stick test. The sensitivities {@code ∂x/∂p, ∂ω/∂p} for each integrated
 * parameter p (release angle, b, Tc, c, J0) ride along as its secondary equation: with
 * {@code f = ω'} and the half-swing sign s frozen, {@code (∂x/∂p)' = ∂ω/∂p} and
 * {@code (∂ω/∂p)' = f_x ∂x/∂p + f_ω ∂ω/∂p + ∂f/∂p}. Error control acts on the primary state
 * only, so the steps, and x and ω themselves, are those of a plain run.
 *
 * <p>Reversals are events on ω = 0 whose time depends on p. The jump condition of trajectory
 * sensitivities across a switching event (Hiskens &amp; Pai, "Trajectory sensitivity analysis
 * of hybrid systems", IEEE Trans. Circuits and Systems I 47(2), 2000) is
 * {@code S⁺ = S⁻ + (F⁻ − F⁺) dτ/dp} with {@code dτ/dp = −S_ω⁻/ω'⁻}; since x' = ω = 0 at the
 * event only ∂ω/∂p jumps: {@code S_ω⁺ = S_ω⁻ ω'⁺/ω'⁻}, with ω'⁻ and ω'⁺ from the equation. When
 * the body sticks, ω'⁺ = 0, so S_ω⁺ = 0 while ∂x/∂p freezes. The stick decision itself
 * (|K sin x| ≤ Ts) is discrete and contributes no gradient.
 *
 * <p>With no parameters the run carries no companion at all: the same motion (the steps follow
 * the primary state only), for evaluations that need the values and not the Jacobian.
 *
 * <p>One instance per session and thread; its output buffers are reused between evaluations.
 */
final class SensitivitySwing {

    private final ParameterKind[] kinds;
    private final int count;
    /** Outputs per sample: deviation x (rad), ω (rad/s), and ∂x/∂p per integrated parameter. */
    final double[] angle;
    final double[] velocity;
    final double[][] sensitivity;
    private final SwingSampler sampler;
    private final Variational variational;
    private final ODEStepHandler cancelCheck = new CancelCheck();

    private SwingEquation equation;
    private double tolerance;
    private BooleanSupplier cancel;
    private SwingIntegration last;

    /**
     * @param capacity largest number of samples of one run
     * @param kinds    the integrated parameters whose sensitivities are wanted, in column order
     */
    SensitivitySwing(int capacity, ParameterKind[] kinds) {
        this.kinds = kinds.clone();
        this.count = kinds.length;
        final int[] columns = new int[count];
        for (int p = 0; p < count; p++) {
            columns[p] = 2 * p;
        }
        this.sampler = new SwingSampler(capacity, columns);
        this.angle = sampler.angles();
        this.velocity = sampler.velocities();
        this.sensitivity = new double[count][];
        for (int p = 0; p < count; p++) {
            sensitivity[p] = sampler.companion(p);
        }
        this.variational = new Variational();
    }

    /** Sets the model for the next run (SI units); the larger of ts and tc holds the body at rest. */
    void configure(double k, double j, double b, double tc, double ts, double c, double relativeTolerance,
            BooleanSupplier cancelCheckSupplier) {
        this.equation = SwingEquation.release(k, j, b, tc, ts, c);
        this.tolerance = relativeTolerance;
        this.cancel = cancelCheckSupplier;
    }

    /**
     * Integrates a release from rest at deviation x0 and fills the outputs at samples
     * {@code from..to-1} whose times since release are {@code times[i]} (non-decreasing;
     * samples at or before the release get the held state).
     */
    void run(double x0, double[] times, int from, int to) {
        sampler.start(times, from, to);
        final SwingIntegration integration = new SwingIntegration(equation, tolerance, count == 0 ? null : variational,
                sampler);
        if (cancel != null) {
            integration.observe(cancelCheck);
        }
        integration.run(x0, 0);
        last = integration;
    }

    /** The turning points of the last run (times since release, deviations). */
    List<TurningPoint> turningPoints() {
        return last.turningPoints();
    }

    /** When the last run came to rest (s since release), or NaN when it moves at the end. */
    double stopTime() {
        return last.stopTime();
    }

    /** The variational equations, carried as the secondary state. */
    private final class Variational implements SwingCompanion {

        private final double[] secondaryDot = new double[2 * count];

        @Override
        public int getDimension() {
            return 2 * count;
        }

        @Override
        public double[] initialState() {
            final double[] s = new double[2 * count];
            for (int p = 0; p < count; p++) {
                s[2 * p] = kinds[p] == ParameterKind.RELEASE_ANGLE ? 1 : 0;
            }
            return s;
        }

        @Override
        public double[] computeDerivatives(double t, double[] primary, double[] primaryDerivative,
                double[] secondary) {
            final SwingEquation e = equation;
            final double w = primary[1];
            final double fx = e.accelerationPerAngle(primary[0]);
            final double fw = e.accelerationPerVelocity(w);
            for (int p = 0; p < count; p++) {
                final double direct = switch (kinds[p]) {
                    case VISCOUS -> e.accelerationPerViscous(w);
                    case COULOMB -> e.accelerationPerCoulomb();
                    case DRAG -> e.accelerationPerDrag(w);
                    case INERTIA -> e.accelerationPerInertia(primaryDerivative[1]);
                    default -> 0;
                };
                secondaryDot[2 * p] = secondary[2 * p + 1];
                secondaryDot[2 * p + 1] = fx * secondary[2 * p] + fw * secondary[2 * p + 1] + direct;
            }
            return secondaryDot;
        }

        @Override
        public void reversal(double[] state, double accelerationBefore, double accelerationAfter) {
            final double ratio = accelerationAfter == 0 ? 0 : accelerationAfter / accelerationBefore;
            for (int p = 0; p < count; p++) {
                state[2 * p + 1] *= ratio;
            }
        }
    }

    /** Ends the run at the next accepted step once the fit is cancelled. */
    private final class CancelCheck implements ODEStepHandler {

        @Override
        public void handleStep(ODEStateInterpolator interpolator) {
            if (cancel.getAsBoolean()) {
                throw new FitCancelledException();
            }
        }
    }
}
