package dev.penduline.physics.motion;

import java.util.Arrays;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;

/**
 * The equation of motion of a half-swing, its reversal event and the stick test: the one
 * definition that the simulator and the identification's sensitivity integration both integrate
 * (through {@link SwingIntegration}).
 *
 * <p>State (θ, ω) in the model's frame: the sensor's frame for the simulator, the deviation from
 * the hanging equilibrium (θeq = 0) for the identification; with the energy account, followed by
 * the energies dissipated by the viscous, Coulomb and drag terms and the work of the applied
 * torque ({@code ∫ T ω dt} of each), integrated and error-controlled with the motion so that the
 * account is as accurate as it. While the body moves,
 * {@code J0 ω' = −K sin(θ − θeq) − b ω − s Tc − s c ω² + T_applied(t, θ, ω)}, K = m g Lc cos α,
 * with the friction sign s frozen over the half-swing, so that the right-hand side stays smooth
 * up to and beyond ω = 0 (with smoothing, {@code Tc tanh(ω/ε) + c ω|ω|} instead, and no events
 * stop the run). While the body is held, θ' = ω' = 0.
 *
 * <p>The event function is {@code s ω} while moving (it falls through zero at the reversal) and
 * {@code Ts − |net torque at rest|} while held (an applied torque breaking the body away). Zeros
 * of ω are about half a small-angle period T = 2π/ωn apart, so the function is checked every T/8
 * and its root located to {@code max(0.01 × tolerance × T, 4 ulp)}; Hipparchus' defaults
 * (600 s, 1e-6 s) would step over whole swings and place reversals far too coarsely. When
 * nothing swings (K = 0) the run's length stands in for T.
 *
 * <p>Stick test at a turning point (Coulomb's law of static friction): the body stays when the
 * torque friction must resist there, {@code |−K sin(θ − θeq) + T_applied(t, θ, 0)|}, is within
 * the holding torque Ts; otherwise it swings on in the direction of that torque.
 * {@link #accelerationAtRest} called before and after the test gives the ω'⁻ and ω'⁺ of the
 * sensitivities' jump condition (ω'⁺ = 0 when the body sticks); the partial derivatives of ω'
 * give their variational equations.
 *
 * <p>An instance holds the mode of one run (sign, held), so it serves one thread; the torques it
 * reads are immutable and shared.
 */
public final class SwingEquation implements OrdinaryDifferentialEquation, ODEEventDetector {

    private static final int MAX_ROOT_ITERATIONS = 100;

    private final SwingModel model;
    private final double[] derivatives;
    private double timeScale;
    private double threshold;
    private AdaptableInterval maxCheck;
    private BracketedUnivariateSolver<UnivariateFunction> solver;
    private ODEEventHandler handler;
    private double sign;
    private boolean stuck;

    /** The equation of a configuration; with {@code energyAccount}, four energy integrals follow θ and ω. */
    SwingEquation(SwingModel model, boolean energyAccount) {
        this.model = model;
        this.derivatives = new double[energyAccount ? 6 : 2];
    }

    /**
     * The equation the identification fits: a release in deviation coordinates (θeq = 0), full
     * gravity, exact friction sign, no applied torque. The friction values are taken as given
     * (a finite-difference probe may make one slightly negative).
     *
     * @param stiffness gravity stiffness K = m g Lc cos α (N·m/rad)
     * @param inertia   pivot inertia J0 (kg·m²), &gt; 0
     * @param viscous   viscous coefficient b (N·m·s/rad)
     * @param coulomb   Coulomb torque Tc (N·m)
     * @param holding   static torque Ts (N·m); the larger of it and Tc holds the body at rest
     * @param drag      quadratic drag coefficient c (N·m·s²/rad²)
     * @return the equation, ready for a {@link SwingIntegration}
     */
    public static SwingEquation release(double stiffness, double inertia, double viscous, double coulomb,
            double holding, double drag) {
        return new SwingEquation(new SwingModel(inertia, stiffness, 0, viscous, coulomb,
                Math.max(holding, coulomb), drag, null, 0, false), false);
    }

    /** Sets the event settings for a run of the given length (s) and clears the mode. */
    void begin(double tolerance, double duration, ODEEventHandler eventHandler) {
        final double wn = model.naturalFrequency();
        this.timeScale = wn > 0 ? 2 * Math.PI / wn : Math.max(duration, 1e-3);
        this.maxCheck = AdaptableInterval.of(timeScale / 8);
        this.threshold = Math.max(1e-2 * tolerance * timeScale, 4 * Math.ulp(duration + timeScale));
        this.solver = new BracketingNthOrderBrentSolver(0, threshold, 0, 5);
        this.handler = eventHandler;
        this.sign = 0;
        this.stuck = false;
    }

    /** The torques and inertia of the configuration. */
    SwingModel model() {
        return model;
    }

    /** The time scale of the run (s): the small-angle period, or the run's length when nothing swings. */
    double timeScale() {
        return timeScale;
    }

    /** Time accuracy of the event (s): a segment no longer than this could not leave rest. */
    double threshold() {
        return threshold;
    }

    // ---- the mode ---------------------------------------------------------------------------

    /** Starts moving in the direction of {@code velocity}. */
    void move(double velocity) {
        stuck = false;
        sign = Math.signum(velocity);
    }

    /** The stick test at a turning point (t, θ); returns whether the body is now held. */
    boolean settle(double t, double theta) {
        final double net = model.netTorqueAtRest(t, theta);
        if (!model.smoothed() && Math.abs(net) <= model.stiction) {
            stuck = true;
        } else {
            move(net);
        }
        return stuck;
    }

    /** Holds the body regardless of the torque (it could not leave rest within the event accuracy). */
    void hold() {
        stuck = true;
    }

    /** The applied torque has overcome stiction at (t, θ): the body moves off in its direction. */
    void breakAway(double t, double theta) {
        move(model.netTorqueAtRest(t, theta));
    }

    boolean stuck() {
        return stuck;
    }

    /** Held with nothing that could ever move it again. */
    boolean heldForGood() {
        return stuck && model.applied == null;
    }

    boolean smoothed() {
        return model.smoothed();
    }

    /**
     * The friction sign s of the current half-swing.
     *
     * @return +1 or −1 (0 before the first decision)
     */
    public double sign() {
        return sign;
    }

    // ---- the right-hand side ----------------------------------------------------------------

    @Override
    public int getDimension() {
        return derivatives.length;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        // one buffer per run: Hipparchus copies the returned array into its own
        final double[] d = derivatives;
        if (stuck) {
            Arrays.fill(d, 0);
            return d;
        }
        final double omega = y[1];
        d[0] = omega;
        d[1] = acceleration(t, y[0], omega);
        if (d.length > 2) {
            final SwingModel m = model;
            d[2] = m.viscousTorque(omega) * omega;
            d[3] = m.coulombTorque(omega, sign) * omega;
            d[4] = m.dragTorque(omega, sign) * omega;
            d[5] = m.appliedTorque(t, y[0], omega) * omega;
        }
        return d;
    }

    /**
     * The angular acceleration ω' in the current mode (zero while held).
     *
     * @param t     time since release (s)
     * @param theta angle in the model's frame (rad)
     * @param omega angular velocity (rad/s)
     * @return ω' (rad/s²)
     */
    public double acceleration(double t, double theta, double omega) {
        if (stuck) {
            return 0;
        }
        final SwingModel m = model;
        return (m.gravityTorque(theta) - m.viscousTorque(omega) - (m.coulombTorque(omega, sign)
                + m.dragTorque(omega, sign)) + m.appliedTorque(t, theta, omega)) / m.inertia;
    }

    /**
     * ω' at ω = 0 in the current mode: called just before and just after the stick test at a
     * reversal, the ω'⁻ and ω'⁺ of the sensitivities' jump condition.
     *
     * @param t     time of the reversal (s)
     * @param theta angle there (rad)
     * @return ω' (rad/s²), zero while held
     */
    public double accelerationAtRest(double t, double theta) {
        return acceleration(t, theta, 0);
    }

    // ---- partial derivatives of ω' (exact sign, no applied torque: what the fit integrates) ---
    // Units: θ in rad, ω in rad/s, ω' in rad/s²; each is zero while the body is held.

    /** ∂ω'/∂θ = −K cos(θ − θeq) / J0 (1/s²) at angle θ (rad). */
    public double accelerationPerAngle(double theta) {
        if (stuck) {
            return 0;
        }
        final double cos = model.linearGravity ? 1 : Math.cos(theta - model.equilibrium);
        return -model.stiffness * cos * model.inverseInertia;
    }

    /** ∂ω'/∂ω = −(b + 2 s c ω) / J0 (1/s) at velocity ω (rad/s), within the half-swing. */
    public double accelerationPerVelocity(double omega) {
        return stuck ? 0 : -(model.viscous + 2 * sign * model.drag * omega) * model.inverseInertia;
    }

    /** ∂ω'/∂b = −ω / J0 (rad/(kg·m²·s)) at velocity ω (rad/s). */
    public double accelerationPerViscous(double omega) {
        return stuck ? 0 : -omega * model.inverseInertia;
    }

    /** ∂ω'/∂Tc = −s / J0 (1/(kg·m²)) within the half-swing. */
    public double accelerationPerCoulomb() {
        return stuck ? 0 : -sign * model.inverseInertia;
    }

    /** ∂ω'/∂c = −s ω² / J0 (rad²/(kg·m²·s²)) at velocity ω (rad/s), within the half-swing. */
    public double accelerationPerDrag(double omega) {
        return stuck ? 0 : -sign * omega * omega * model.inverseInertia;
    }

    /** ∂ω'/∂J0 = −ω' / J0 (rad/(kg·m²·s²)), given ω' (rad/s²) at the same state. */
    public double accelerationPerInertia(double acceleration) {
        return -acceleration * model.inverseInertia;
    }

    // ---- the reversal (and breakaway) event -------------------------------------------------

    @Override
    public double g(ODEStateAndDerivative state) {
        final double[] y = state.getPrimaryState();
        if (stuck) {
            return model.stiction - Math.abs(model.netTorqueAtRest(state.getTime(), y[0]));
        }
        return model.smoothed() ? y[1] : sign * y[1];
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
        return handler;
    }
}
