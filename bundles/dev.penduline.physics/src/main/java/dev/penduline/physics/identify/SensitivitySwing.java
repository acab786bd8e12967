package dev.penduline.physics.identify;

import java.util.function.BooleanSupplier;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ExpandableODE;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.SecondaryODE;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

import dev.penduline.physics.motion.ChebyshevStep;

/**
 * A release from rest integrated together with its sensitivity (variational) equations.
 *
 * <p>Primary state: the deviation x = θ − θeq and ω. Secondary state: {@code ∂x/∂p, ∂ω/∂p} for
 * each integrated parameter p (release angle, b, Tc, c, J0). With
 * {@code f = (−K sin x − b ω − s Tc − s c ω²)/J} and the half-swing sign s frozen,
 * {@code (∂x/∂p)' = ∂ω/∂p} and {@code (∂ω/∂p)' = f_x ∂x/∂p + f_ω ∂ω/∂p + ∂f/∂p}.
 * Error control acts on the primary state only, so the steps are those of a plain run.
 *
 * <p>Reversals are events on ω = 0 whose time depends on p. The jump condition of trajectory
 * sensitivities across a switching event (Hiskens &amp; Pai, "Trajectory sensitivity analysis
 * of hybrid systems", IEEE Trans. Circuits and Systems I 47(2), 2000) is
 * {@code S⁺ = S⁻ + (F⁻ − F⁺) dτ/dp} with {@code dτ/dp = −S_ω⁻/ω'⁻}; since x' = ω = 0 at the
 * event only ∂ω/∂p jumps: {@code S_ω⁺ = S_ω⁻ ω'⁺/ω'⁻}. When the body sticks, F⁺ = 0 and the
 * same rule gives S_ω⁺ = 0 while ∂x/∂p freezes. The stick decision itself (|K sin x| ≤ Ts) is
 * discrete and contributes no gradient.
 *
 * <p>One instance per session and thread; its output buffers are reused between evaluations.
 */
final class SensitivitySwing implements OrdinaryDifferentialEquation, ODEEventDetector,
        ODEEventHandler {

    private static final int MAX_SEGMENTS = 1_000_000;
    private static final int MAX_ROOT_ITERATIONS = 100;

    private final ParameterKind[] kinds;
    private final int count;
    /** Outputs per sample: deviation x (rad), ω (rad/s), and ∂x/∂p per integrated parameter. */
    final double[] angle;
    final double[] velocity;
    final double[][] sensitivity;
    private final double[] primaryDot = new double[2];
    private final double[] secondaryDot;
    private final ChebyshevStep polynomial;
    private final StepRecorder recorder = new StepRecorder();
    private final Variational variational = new Variational();

    private double stiffness;
    private double inertia;
    private double viscous;
    private double coulomb;
    private double stiction;
    private double drag;
    private double tolerance;
    private BooleanSupplier cancel;

    private double[] tau;
    private int next;
    private int end;
    private double sign;
    private boolean eventFired;
    private BracketedUnivariateSolver<UnivariateFunction> solver;
    private AdaptableInterval maxCheck;

    /**
     * @param capacity largest number of samples of one run
     * @param kinds    the integrated parameters whose sensitivities are wanted, in column order
     */
    SensitivitySwing(int capacity, ParameterKind[] kinds) {
        this.kinds = kinds.clone();
        this.count = kinds.length;
        this.angle = new double[capacity];
        this.velocity = new double[capacity];
        this.sensitivity = new double[count][capacity];
        this.secondaryDot = new double[2 * count];
        this.polynomial = new ChebyshevStep(2 + count);
    }

    /** Sets the model for the next run (SI units); ts ≥ tc is the holding torque at rest. */
    void configure(double k, double j, double b, double tc, double ts, double c, double relativeTolerance,
            BooleanSupplier cancelCheck) {
        this.stiffness = k;
        this.inertia = j;
        this.viscous = b;
        this.coulomb = tc;
        this.stiction = Math.max(ts, tc);
        this.drag = c;
        this.tolerance = relativeTolerance;
        this.cancel = cancelCheck;
    }

    /**
     * Integrates a release from rest at deviation x0 and fills the outputs at samples
     * {@code from..to-1} whose times since release are {@code times[i]} (non-decreasing;
     * samples at or before the release get the held state).
     */
    void run(double x0, double[] times, int from, int to) {
        this.tau = times;
        this.next = from;
        this.end = to;
        while (next < end && tau[next] <= 0) {
            hold(next, x0, 1.0);
            next++;
        }
        if (next >= end) {
            return;
        }
        final double[] y = {x0, 0};
        final double[] s = new double[2 * count];
        for (int p = 0; p < count; p++) {
            s[2 * p] = kinds[p] == ParameterKind.RELEASE_ANGLE ? 1 : 0;
        }
        final double net = -stiffness * Math.sin(x0);
        if (Math.abs(net) <= stiction) {
            fillStuck(x0, s);
            return;
        }
        sign = Math.signum(net);
        final double wn = Math.sqrt(stiffness / inertia);
        final double period = 2 * Math.PI / wn;
        final double tEnd = tau[end - 1];
        final double threshold = Math.max(1e-2 * tolerance * period, 4 * Math.ulp(tEnd + period));
        solver = new BracketingNthOrderBrentSolver(0, threshold, 0, 5);
        maxCheck = AdaptableInterval.of(period / 8);
        final double amplitude = Math.max(Math.abs(x0), 1e-6);
        final DormandPrince853Integrator integrator = new DormandPrince853Integrator(0, Math.max(tEnd, period),
                new double[] {tolerance * amplitude, tolerance * amplitude * wn},
                new double[] {tolerance, tolerance});
        integrator.addStepHandler(recorder);
        integrator.addEventDetector(this);
        final ExpandableODE ode = new ExpandableODE(this);
        ode.addSecondaryEquations(variational);
        double t = 0;
        double[] state = y;
        double[] sens = s;
        int segments = 0;
        while (t < tEnd) {
            eventFired = false;
            final double start = t;
            final ODEStateAndDerivative last = integrator.integrate(ode,
                    new ODEState(t, state, new double[][] {sens}), tEnd);
            t = last.getTime();
            state = last.getPrimaryState();
            sens = last.getSecondaryState(1);
            if (!eventFired) {
                break;
            }
            final double x = state[0];
            state[1] = 0;
            final double before = (-stiffness * Math.sin(x) - sign * coulomb) / inertia;
            final double holding = -stiffness * Math.sin(x);
            if (t - start <= threshold || Math.abs(holding) <= stiction) {
                // stuck: ∂ω/∂p jumps to zero, ∂x/∂p freezes
                fillStuck(x, sens);
                return;
            }
            sign = Math.signum(holding);
            final double after = (holding - sign * coulomb) / inertia;
            final double ratio = after / before;
            for (int p = 0; p < count; p++) {
                sens[2 * p + 1] *= ratio;
            }
            if (++segments > MAX_SEGMENTS) {
                throw new IllegalStateException("more than " + MAX_SEGMENTS + " reversals before t = " + t + " s");
            }
        }
        // samples exactly at the end of the last step
        while (next < end) {
            record(next, state[0], state[1], sens);
            next++;
        }
    }

    private void hold(int i, double x, double thetaSensitivity) {
        angle[i] = x;
        velocity[i] = 0;
        for (int p = 0; p < count; p++) {
            sensitivity[p][i] = kinds[p] == ParameterKind.RELEASE_ANGLE ? thetaSensitivity : 0;
        }
    }

    private void fillStuck(double x, double[] sens) {
        for (; next < end; next++) {
            angle[next] = x;
            velocity[next] = 0;
            for (int p = 0; p < count; p++) {
                sensitivity[p][next] = sens[2 * p];
            }
        }
    }

    private void record(int i, double x, double w, double[] sens) {
        angle[i] = x;
        velocity[i] = w;
        for (int p = 0; p < count; p++) {
            sensitivity[p][i] = sens[2 * p];
        }
    }

    // ---- equations ------------------------------------------------------------------------------

    @Override
    public int getDimension() {
        return 2;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        final double w = y[1];
        primaryDot[0] = w;
        primaryDot[1] = (-stiffness * Math.sin(y[0]) - viscous * w - sign * (coulomb + drag * w * w)) / inertia;
        return primaryDot;
    }

    // ---- the reversal event --------------------------------------------------------------------

    @Override
    public double g(ODEStateAndDerivative state) {
        return sign * state.getPrimaryState()[1];
    }

    @Override
    public Action eventOccurred(ODEStateAndDerivative state, ODEEventDetector detector, boolean increasing) {
        eventFired = true;
        return Action.STOP;
    }

    @Override
    public AdaptableInterval getMaxCheckInterval() {
        return maxCheck;
    }

    @Override
    public int getMaxIterationCount() {
        return MAX_ROOT_ITERATIONS;
    }

    @Override
    public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
        return solver;
    }

    @Override
    public ODEEventHandler getHandler() {
        return this;
    }

    /** The variational equations, carried as the secondary state. */
    private final class Variational implements SecondaryODE {

        @Override
        public int getDimension() {
            return 2 * count;
        }

        @Override
        public double[] computeDerivatives(double t, double[] primary, double[] primaryDerivative,
                double[] secondary) {
            final double x = primary[0];
            final double w = primary[1];
            final double inverse = 1 / inertia;
            final double fx = -stiffness * Math.cos(x) * inverse;
            final double fw = -(viscous + 2 * sign * drag * w) * inverse;
            for (int p = 0; p < count; p++) {
                final double sx = secondary[2 * p];
                final double sw = secondary[2 * p + 1];
                final double direct = switch (kinds[p]) {
                    case VISCOUS -> -w * inverse;
                    case COULOMB -> -sign * inverse;
                    case DRAG -> -sign * w * w * inverse;
                    case INERTIA -> -primaryDerivative[1] * inverse;
                    default -> 0;
                };
                secondaryDot[2 * p] = sw;
                secondaryDot[2 * p + 1] = fx * sx + fw * sw + direct;
            }
            return secondaryDot;
        }
    }

    /** Fills the samples that fall in each accepted step, and checks for cancellation. */
    private final class StepRecorder implements ODEStepHandler {

        @Override
        public void handleStep(ODEStateInterpolator interpolator) {
            if (cancel != null && cancel.getAsBoolean()) {
                throw new FitCancelledException();
            }
            final double tCurrent = interpolator.getCurrentState().getTime();
            int last = next;
            while (last < end && tau[last] <= tCurrent) {
                last++;
            }
            final double tPrevious = interpolator.getPreviousState().getTime();
            if (last - next > ChebyshevStep.NODES && tCurrent > tPrevious) {
                final ChebyshevStep poly = polynomial;
                poly.begin(tPrevious, tCurrent);
                for (int j = 0; j < ChebyshevStep.NODES; j++) {
                    final ODEStateAndDerivative s = interpolator.getInterpolatedState(poly.nodeTime(j));
                    final double[] y = s.getPrimaryState();
                    final double[] z = s.getSecondaryState(1);
                    poly.set(0, j, y[0]);
                    poly.set(1, j, y[1]);
                    for (int p = 0; p < count; p++) {
                        poly.set(2 + p, j, z[2 * p]);
                    }
                }
                poly.transform();
                for (; next < last; next++) {
                    final double t = tau[next];
                    angle[next] = poly.value(0, t);
                    velocity[next] = poly.value(1, t);
                    for (int p = 0; p < count; p++) {
                        sensitivity[p][next] = poly.value(2 + p, t);
                    }
                }
            } else {
                for (; next < last; next++) {
                    final ODEStateAndDerivative s = interpolator.getInterpolatedState(tau[next]);
                    record(next, s.getPrimaryState()[0], s.getPrimaryState()[1], s.getSecondaryState(1));
                }
            }
        }
    }
}
