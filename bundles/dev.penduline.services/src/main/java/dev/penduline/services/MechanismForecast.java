package dev.penduline.services;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import java.util.function.ToDoubleFunction;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.forecast.AnglePass;
import dev.penduline.physics.forecast.FigureBand;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.forecast.Forecaster;
import dev.penduline.physics.forecast.ParameterDraws;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.inertia.ToleranceSpread;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * What a mechanism will do after a release, with the friction of a stored fit (or given
 * torques), and how far those figures can move within the fit's uncertainty: the use case
 * behind {@code penduline predict} and the workbench's prediction view.
 *
 * <p>Bands: the figures are forecast again for parameter sets drawn from a normal distribution
 * with the fit's estimates as means, the larger of its two standard uncertainties as standard
 * deviations and its correlations; the static torque is drawn uniformly within the stops'
 * band when the fit has one. Draws that come out negative are set to zero (and J0 to m·Lc²);
 * how many were is said in a note. A band is the {@value FigureBand#LOW_PERCENT}th to
 * {@value FigureBand#HIGH_PERCENT}th percentile of a figure over the draws.
 */
public final class MechanismForecast {

    /** Parameter sets drawn for the bands unless told otherwise. */
    public static final int DEFAULT_DRAWS = 200;
    /** The seed of the draws unless told otherwise, so that a prediction is reproducible. */
    public static final long DEFAULT_SEED = 20_261_202L;

    /**
     * Where the friction comes from.
     *
     * @param fit         the stored fit, or null for given torques
     * @param friction    the torques (SI)
     * @param description where they came from, in words
     */
    public record FrictionSource(StoredFit fit, FrictionTorques friction, String description) {

        /**
         * The friction of a stored fit.
         *
         * @param fit the fit
         * @return the source
         */
        public static FrictionSource of(StoredFit fit) {
            return new FrictionSource(fit, fit.friction(), "stored fit " + fit.id() + " (" + fit.name() + ")");
        }

        /**
         * Friction torques given directly.
         *
         * @param friction    the torques
         * @param description where they came from, e.g. "friction options (no uncertainty)"
         * @return the source
         */
        public static FrictionSource given(FrictionTorques friction, String description) {
            return new FrictionSource(null, friction, description);
        }
    }

    /**
     * The bands of the forecast figures (null members when a figure was not asked for).
     *
     * @param settleTime   settle time (s)
     * @param halfSwings   half-swings before settling
     * @param restLower    lower end of the rest band (rad)
     * @param restUpper    upper end of the rest band (rad)
     * @param peakVelocity peak angular velocity (rad/s)
     * @param peakTime     when the peak occurs (s)
     * @param maxOvershoot largest overshoot (rad)
     * @param passVelocity angular velocity at the chosen angle (rad/s, signed)
     * @param tipSpeed     speed of the chosen point at that angle (m/s)
     * @param passEnergy   kinetic energy at that angle (J)
     */
    public record Bands(FigureBand settleTime, FigureBand halfSwings, FigureBand restLower, FigureBand restUpper,
            FigureBand peakVelocity, FigureBand peakTime, FigureBand maxOvershoot, FigureBand passVelocity,
            FigureBand tipSpeed, FigureBand passEnergy) {
    }

    /**
     * A forecast with its bands.
     *
     * @param source         where the friction came from
     * @param pivotInertia   the J0 used (kg·m²)
     * @param inertiaSource  "fitted" or "calculated" (or "given")
     * @param request        the release and the questions
     * @param nominal        the forecast with the best estimates
     * @param bands          the bands
     * @param draws          how many parameter sets were drawn (0: no uncertainty known)
     * @param seed           the seed of the draws
     * @param bandDefinition what a band means, in words
     * @param notes          what the user should know about the draws
     * @param properties     the lumped properties the nominal forecast used (about the equilibrium)
     */
    public record Outcome(FrictionSource source, double pivotInertia, String inertiaSource, ForecastRequest request,
            SwingForecast nominal, Bands bands, int draws, long seed, String bandDefinition, List<String> notes,
            MechanismProperties properties) {

        /** Copies the list so the record stays immutable. */
        public Outcome {
            notes = List.copyOf(notes);
        }
    }

    private MechanismForecast() {
    }

    /**
     * Forecasts the swing after a release.
     *
     * @param mechanism the mechanism
     * @param source    where the friction comes from
     * @param request   the release and the questions (angles from the hanging equilibrium)
     * @param draws     parameter sets for the bands, ≥ 0
     * @param seed      the seed of the draws
     * @return the forecast
     * @throws InputException when the mechanism cannot swing or a value is out of range
     */
    public static Outcome forecast(MechanismSource mechanism, FrictionSource source, ForecastRequest request, int draws,
            long seed) throws InputException {
        MechanismProperties p = mechanism.properties();
        SwingPrediction.requireSwing(p, source.friction(), request.releaseAngle(), request.releaseVelocity());
        StoredFit fit = source.fit();
        boolean fitted = usesFittedInertia(source);
        MechanismProperties base = properties(mechanism, source);
        String inertiaSource = fitted ? "fitted" : mechanism.inertia().isPresent() ? "calculated" : "given";
        SwingForecast nominal;
        try {
            nominal = new Forecaster(new SwingSimulator(base, source.friction())).forecast(request);
        } catch (InvalidValueException e) {
            throw new InputException(e.getMessage(), e);
        }
        List<String> notes = new ArrayList<>();
        boolean fitSpread = fit != null && fit.hasUncertainty();
        boolean partsSpread = mechanism.hasTolerances();
        if (draws == 0 || !fitSpread && !partsSpread) {
            if (fit != null && !fitSpread && draws > 0) {
                notes.add("the stored fit carries no uncertainties and the parts no tolerances, so the figures have no bands");
            }
            return new Outcome(source, base.pivotInertia(), inertiaSource, request, nominal, bands(nominal, List.of()),
                    0, seed, "no band: no uncertainty of the friction or the parts is known", notes, base);
        }
        List<double[]> parts = List.of();
        if (partsSpread) {
            ToleranceSpread.Result r;
            try {
                r = ToleranceSpread.of(mechanism.frame(), mechanism.parts(), Math.max(2, draws), seed);
            } catch (InvalidValueException e) {
                throw new InputException(mechanism.label() + ": " + e.getMessage(), e);
            }
            parts = r.draws();
            if (r.failed() > 0) {
                notes.add(r.failed() + " of " + draws + " draws over the parts' tolerances could not be computed and were"
                        + " drawn again from the rest");
            }
        }
        double[][] sets;
        try {
            sets = fitSpread ? ParameterDraws.draw(fit.values(), fit.sigmas(), fit.correlation(), draws, seed) : null;
        } catch (InvalidValueException e) {
            throw new InputException(mechanism.label() + ": stored fit " + fit.id() + ": " + e.getMessage() + "; fit again", e);
        }
        List<SwingForecast> drawn = new ArrayList<>(draws);
        int clamped = 0;
        Random stiction = new Random(seed ^ 0x5DEECE66DL);
        for (int n = 0; n < draws; n++) {
            FrictionTorques torques = source.friction();
            double mass = base.mass();
            double lc = base.centroidDistance();
            double j0 = base.pivotInertia();
            if (!parts.isEmpty()) {
                double[] d = parts.get(n % parts.size());
                mass = d[0];
                lc = d[1];
                j0 = fitted ? j0 : d[2];
            }
            if (sets != null) {
                j0 = fit.inertiaOf(sets[n], j0);
                double ts = Double.isFinite(fit.stictionLower())
                        ? fit.stictionLower() + stiction.nextDouble() * (fit.stictionUpper() - fit.stictionLower()) : 0;
                torques = fit.frictionOf(sets[n], ts);
                clamped += fit.cutsFriction(sets[n]) || j0 < mass * lc * lc ? 1 : 0;
            }
            MechanismProperties props = new MechanismProperties(mass, lc, Math.max(j0, mass * lc * lc), 0, base.gravity(),
                    base.axisTilt());
            drawn.add(new Forecaster(new SwingSimulator(props, torques)).forecast(request));
        }
        if (clamped > 0) {
            notes.add(String.format(Locale.ROOT, "%d of %d draws had a negative term (or J0 below m·Lc²) and were cut to the"
                    + " limit: the fit hardly determines that term", clamped, draws));
        }
        long unsettled = drawn.stream().filter(f -> !f.settled()).count();
        if (unsettled > 0) {
            notes.add(String.format(Locale.ROOT, "%d of %d draws do not settle in the band; the settle-time band is over the"
                    + " %d that do", unsettled, draws, draws - unsettled));
        }
        List<String> from = new ArrayList<>();
        if (fitSpread) {
            from.add("the fit's estimates, uncertainties and correlations (normal)"
                    + (Double.isFinite(fit.stictionLower()) ? " with the static torque uniform within the stops' band" : ""));
        }
        if (partsSpread) {
            from.add("the parts' mass and dimension tolerances (uniform within ±)" + (fitted ? ", J0 kept as fitted" : ""));
        }
        String definition = String.format(Locale.ROOT, "low and high are the %.0fth and %.0fth percentiles of each figure over"
                + " %d parameter sets drawn from %s, seed %d", FigureBand.LOW_PERCENT, FigureBand.HIGH_PERCENT, draws,
                String.join(" and from ", from), seed);
        return new Outcome(source, base.pivotInertia(), inertiaSource, request, nominal, bands(nominal, drawn), draws, seed,
                definition, notes, base);
    }

    /**
     * The properties a swing with this friction is simulated with: the mechanism's, measured
     * from its hanging equilibrium, with the fitted J0 when the fit freed the inertia (the swing
     * records measured it).
     *
     * @param mechanism the mechanism
     * @param source    where the friction comes from
     * @return the properties, equilibrium angle 0
     */
    public static MechanismProperties properties(MechanismSource mechanism, FrictionSource source) {
        MechanismProperties p = mechanism.properties();
        double j0 = usesFittedInertia(source) ? Math.max(source.fit().fittedInertia(), minimumInertia(p)) : p.pivotInertia();
        return new MechanismProperties(p.mass(), p.centroidDistance(), j0, 0, p.gravity(), p.axisTilt());
    }

    /**
     * Whether the friction's fit freed the inertia, so that its J0 replaces the calculated one.
     *
     * @param source where the friction comes from
     * @return true when the fitted J0 is used
     */
    public static boolean usesFittedInertia(FrictionSource source) {
        return source.fit() != null && Double.isFinite(source.fit().fittedInertia());
    }

    /**
     * The forecast figures of a simulated run (settle time, peak speed, ...).
     *
     * @param properties the properties the run was simulated with ({@link #properties})
     * @param friction   its friction
     * @param run        the run
     * @param request    its release and the questions
     * @return the figures over the run's length
     */
    public static SwingForecast summarise(MechanismProperties properties, FrictionTorques friction, SwingRun run,
            ForecastRequest request) {
        return new Forecaster(new SwingSimulator(properties, friction)).summarise(run, request);
    }

    /**
     * A what-if: the same forecast for the mechanism with changed parts. When the fit freed the
     * inertia, the changed mechanism's J0 is the fitted one moved by the change of the calculated
     * J0 (the swing measured the mechanism as built; the change is what the parts say).
     *
     * @param mechanism the mechanism as it is
     * @param changed   the mechanism with the changes (computed from its parts)
     * @param source    the friction
     * @param request   the release and questions
     * @param draws     parameter sets for the bands
     * @param seed      their seed
     * @return the forecast of the changed mechanism
     * @throws InputException when the changed mechanism cannot swing
     */
    public static Outcome whatIf(MechanismSource mechanism, MechanismSource changed, FrictionSource source,
            ForecastRequest request, int draws, long seed) throws InputException {
        FrictionSource moved = source;
        if (usesFittedInertia(source)) {
            StoredFit f = source.fit();
            double shift = changed.properties().pivotInertia() - mechanism.properties().pivotInertia();
            StoredFit shifted = new StoredFit(f.id(), f.name(), f.friction(), f.fittedInertia() + shift, f.parameters(),
                    shiftedValues(f, shift), f.sigmas(), f.correlation(), f.stictionLower(), f.stictionUpper(), f.stale());
            moved = new FrictionSource(shifted, source.friction(), source.description());
        }
        return forecast(changed, moved, request, draws, seed);
    }

    private static double[] shiftedValues(StoredFit f, double shift) {
        double[] v = f.values().clone();
        for (int i = 0; i < v.length; i++) {
            if ("J0".equals(f.parameters().get(i))) {
                v[i] += shift;
            }
        }
        return v;
    }

    private static double minimumInertia(MechanismProperties p) {
        return p.mass() * p.centroidDistance() * p.centroidDistance();
    }

    private static Bands bands(SwingForecast n, List<SwingForecast> drawn) {
        boolean pass = n.pass().isPresent();
        return new Bands(band(n, drawn, f -> f.settled() ? f.settleTime() : Double.NaN),
                band(n, drawn, f -> f.settled() ? f.halfSwings() : Double.NaN),
                band(n, drawn, f -> f.restBand().lower()), band(n, drawn, f -> f.restBand().upper()),
                band(n, drawn, SwingForecast::peakAngularVelocity), band(n, drawn, SwingForecast::peakTime),
                band(n, drawn, SwingForecast::maxOvershoot),
                pass ? band(n, drawn, f -> passFigure(f, AnglePass::angularVelocity)) : null,
                pass && Double.isFinite(n.pass().get().tipSpeed()) ? band(n, drawn, f -> passFigure(f, AnglePass::tipSpeed))
                        : null,
                pass ? band(n, drawn, f -> passFigure(f, AnglePass::kineticEnergy)) : null);
    }

    private static double passFigure(SwingForecast f, ToDoubleFunction<AnglePass> figure) {
        Optional<AnglePass> pass = f.pass();
        return pass.isPresent() ? figure.applyAsDouble(pass.get()) : Double.NaN;
    }

    private static FigureBand band(SwingForecast nominal, List<SwingForecast> drawn, ToDoubleFunction<SwingForecast> figure) {
        double[] values = new double[drawn.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = figure.applyAsDouble(drawn.get(i));
        }
        return FigureBand.of(figure.applyAsDouble(nominal), values);
    }
}
