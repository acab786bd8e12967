package dev.penduline.services;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalStateException;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.forecast.AnglePass;
import dev.penduline.physics.forecast.FigureBand;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.forecast.Forecaster;
import dev.penduline.physics.forecast.ParameterDraws;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * The inverse question: how much damping must be added so that a mechanism meets a spec —
 * settling inside the band within a time, or passing an angle below a speed. The added viscous
 * coefficient (or dry-friction torque, which raises the static torque by as much) is found with a
 * bracketing root finder (Hipparchus' {@link BracketingNthOrderBrentSolver}, taking the side of
 * the root where the spec is met) on the same simulator the forecasts use.
 *
 * <p>The search stays within what the term can do: viscous damping up to critical damping
 * (ζ = 1; beyond it the body only creeps, more slowly with more damping), dry friction below the
 * torque at which static friction would hold the body outside the band (for a settle spec) or at
 * its release angle (for a speed spec). When the spec cannot be met within that range, the answer
 * says so and why.
 */
public final class SpecDesign {

    /** Which term is added. */
    public enum Term {
        /** Viscous damping b (N·m·s/rad). */
        VISCOUS("N·m·s/rad"),
        /** Dry (Coulomb) friction Tc, with the static torque raised by as much (N·m). */
        COULOMB("N·m");

        private final String unit;

        Term(String unit) {
            this.unit = unit;
        }

        /**
         * The SI unit of the term.
         *
         * @return the unit
         */
        public String unit() {
            return unit;
        }
    }

    /**
     * The spec: a settle time, or a speed limit at an angle.
     *
     * @param settleWithin the time within which the swing must settle inside the request's band (s), or NaN
     * @param speedAngle   the angle from the equilibrium at which the speed is limited (rad), or NaN
     * @param speedLimit   the largest |ω| allowed when first passing that angle (rad/s), or NaN
     */
    public record Spec(double settleWithin, double speedAngle, double speedLimit) {

        /**
         * A settle-time spec.
         *
         * @param seconds the time (s), &gt; 0
         * @return the spec
         */
        public static Spec settleWithin(double seconds) {
            return new Spec(seconds, Double.NaN, Double.NaN);
        }

        /**
         * A speed spec.
         *
         * @param angle angle from the equilibrium (rad)
         * @param limit largest |ω| there (rad/s), ≥ 0
         * @return the spec
         */
        public static Spec maxSpeedAt(double angle, double limit) {
            return new Spec(Double.NaN, angle, limit);
        }

        boolean isSettle() {
            return !Double.isNaN(settleWithin);
        }
    }

    /**
     * The answer.
     *
     * @param term       the term added
     * @param added      how much must be added (SI), NaN when no amount meets the spec
     * @param total      the term's total with the addition (SI), NaN when none meets it
     * @param meets      whether the re-simulated swing meets the spec
     * @param figure     the figure the spec is about, re-simulated with the addition (settle time in
     *                   s, or |ω| in rad/s; 0 when the angle is no longer reached)
     * @param baseline   the same figure without the addition
     * @param reason     why no amount meets it, or what the answer means, in words
     * @param addedBand  the spread of {@code added} over parameter sets drawn from the fit, or empty
     * @param figureName what {@code figure} is, with its unit ("settle time (s)", "speed passing the angle (rad/s)")
     */
    public record Answer(Term term, double added, double total, boolean meets, double figure, double baseline,
            String reason, Optional<FigureBand> addedBand, String figureName) {
    }

    /** A root is located to this fraction of the search range. */
    private static final double RELATIVE_ACCURACY = 1e-7;
    private static final int MAX_EVALUATIONS = 100;
    /** The settle time given to a swing that does not settle, so that the root finder can bracket. */
    private static final double NEVER = 1e12;
    /** Parameter sets drawn to show how sure the answer is. */
    public static final int SENSITIVITY_DRAWS = 20;

    private SpecDesign() {
    }

    /**
     * Finds the smallest addition of a term that meets the spec.
     *
     * @param properties the mechanism, about its equilibrium
     * @param friction   its friction
     * @param request    the release (and the band, for a settle spec)
     * @param spec       the spec
     * @param term       the term to add
     * @return the answer
     */
    public static Answer design(MechanismProperties properties, FrictionTorques friction, ForecastRequest request,
            Spec spec, Term term) {
        final ForecastRequest asked = spec.isSettle() ? request
                : new ForecastRequest(request.releaseAngle(), request.releaseVelocity(), request.band(), spec.speedAngle(),
                        request.radius());
        final DoubleUnaryOperator figure = delta -> figure(properties, with(friction, term, delta), asked, spec);
        final double target = spec.isSettle() ? spec.settleWithin() : spec.speedLimit();
        final double baseline = figure.applyAsDouble(0);
        if (baseline <= target) {
            return new Answer(term, 0, total(friction, term, 0), true, baseline, baseline,
                    "the mechanism meets the spec as it is: nothing needs to be added", Optional.empty(), name(spec));
        }
        final double most = largest(properties, friction, asked, spec, term);
        if (!(most > 0)) {
            return new Answer(term, Double.NaN, Double.NaN, false, baseline, baseline, limitReason(properties, friction,
                    asked, spec, term, most), Optional.empty(), name(spec));
        }
        final double atMost = figure.applyAsDouble(most);
        if (atMost > target) {
            return new Answer(term, Double.NaN, Double.NaN, false, atMost, baseline,
                    limitReason(properties, friction, asked, spec, term, most) + String.format(Locale.ROOT,
                            "; there the %s is still %.4g %s", spec.isSettle() ? "settle time" : "speed",
                            atMost >= NEVER ? Double.POSITIVE_INFINITY : atMost, spec.isSettle() ? "s" : "rad/s"),
                    Optional.empty(), name(spec));
        }
        final double added = solve(figure, target, most);
        final double found = figure.applyAsDouble(added);
        return new Answer(term, added, total(friction, term, added), found <= target, found, baseline,
                "the smallest addition that meets the spec, re-simulated", Optional.empty(), name(spec));
    }

    /**
     * As {@link #design}, with the spread of the answer over parameter sets drawn from a stored
     * fit's uncertainty ({@value #SENSITIVITY_DRAWS} sets, 5th to 95th percentile).
     *
     * @param properties the mechanism, about its equilibrium
     * @param fit        the stored fit (its friction is the baseline)
     * @param request    the release
     * @param spec       the spec
     * @param term       the term to add
     * @param seed       the seed of the draws
     * @return the answer with its band
     */
    public static Answer design(MechanismProperties properties, StoredFit fit, ForecastRequest request, Spec spec, Term term,
            long seed) {
        final Answer nominal = design(properties, fit.friction(), request, spec, term);
        if (Double.isNaN(nominal.added()) || !fit.hasUncertainty()) {
            return nominal;
        }
        final double[][] sets = ParameterDraws.draw(fit.values(), fit.sigmas(), fit.correlation(), SENSITIVITY_DRAWS, seed);
        final List<Double> added = new ArrayList<>();
        final double minimum = properties.mass() * properties.centroidDistance() * properties.centroidDistance();
        for (double[] set : sets) {
            final MechanismProperties p = properties.withPivotInertia(Math.max(fit.inertiaOf(set, properties.pivotInertia()),
                    minimum));
            final FrictionTorques f = fit.frictionOf(set, fit.friction().staticTorque());
            final Answer a = design(p, f, request, spec, term);
            added.add(Double.isNaN(a.added()) ? Double.NaN : a.added());
        }
        final FigureBand band = FigureBand.of(nominal.added(), added.stream().mapToDouble(Double::doubleValue).toArray());
        return new Answer(nominal.term(), nominal.added(), nominal.total(), nominal.meets(), nominal.figure(),
                nominal.baseline(), nominal.reason(), Optional.of(band), nominal.figureName());
    }

    private static String name(Spec spec) {
        return spec.isSettle() ? "settle time (s)" : "speed passing the angle (rad/s)";
    }

    private static double solve(DoubleUnaryOperator figure, double target, double most) {
        final BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(RELATIVE_ACCURACY * most, 5);
        try {
            return solver.solve(MAX_EVALUATIONS, x -> figure.applyAsDouble(x) - target, 0, most, AllowedSolution.RIGHT_SIDE);
        } catch (MathIllegalStateException e) {
            // the figure jumps (a settle time moves by half-swings): bisect on the sign instead
            double lo = 0;
            double hi = most;
            for (int i = 0; i < MAX_EVALUATIONS && hi - lo > RELATIVE_ACCURACY * most; i++) {
                final double mid = 0.5 * (lo + hi);
                if (figure.applyAsDouble(mid) <= target) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            return hi;
        }
    }

    /** The largest addition worth trying (see the class comment). */
    private static double largest(MechanismProperties p, FrictionTorques f, ForecastRequest request, Spec spec, Term term) {
        final double k = p.gravityStiffness();
        if (term == Term.VISCOUS) {
            return 2 * Math.sqrt(k * p.pivotInertia()) - f.viscous();
        }
        final double holdAt = spec.isSettle() ? request.band() : Math.abs(request.releaseAngle());
        return (1 - 1e-6) * k * Math.sin(Math.min(holdAt, Math.PI / 2)) - f.staticTorque();
    }

    private static String limitReason(MechanismProperties p, FrictionTorques f, ForecastRequest request, Spec spec,
            Term term, double most) {
        if (term == Term.VISCOUS) {
            final double critical = 2 * Math.sqrt(p.gravityStiffness() * p.pivotInertia());
            return String.format(Locale.ROOT, "no added viscous damping meets it: the search goes up to critical damping"
                    + " (b = %.4g N·m·s/rad, damping ratio 1), beyond which the body only creeps, more slowly with more"
                    + " damping%s", critical, most > 0 ? "" : "; the mechanism is at or beyond it already");
        }
        return String.format(Locale.ROOT, "no added dry friction meets it: with %s more than %.4g N·m of static torque,"
                + " static friction would hold the body %s", most > 0 ? "" : "already", Math.max(0, most + f.staticTorque()),
                spec.isSettle() ? "outside the band" : "at its release angle");
    }

    private static FrictionTorques with(FrictionTorques f, Term term, double delta) {
        return term == Term.VISCOUS ? f.withViscous(f.viscous() + delta)
                : new FrictionTorques(f.viscous(), f.coulomb() + delta, f.staticTorque() + delta, f.drag());
    }

    private static double total(FrictionTorques f, Term term, double delta) {
        return term == Term.VISCOUS ? f.viscous() + delta : f.coulomb() + delta;
    }

    private static double figure(MechanismProperties p, FrictionTorques f, ForecastRequest request, Spec spec) {
        final SwingForecast forecast = new Forecaster(new SwingSimulator(p, f)).forecast(request);
        if (spec.isSettle()) {
            return forecast.settled() ? forecast.settleTime() : NEVER;
        }
        final Optional<AnglePass> pass = forecast.pass();
        return pass.map(a -> Math.abs(a.angularVelocity())).orElse(0.0);
    }
}
