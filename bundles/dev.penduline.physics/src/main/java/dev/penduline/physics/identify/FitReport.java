package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Stream;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;

/**
 * Turns a point fit, its uncertainties and its energy account into a {@link FrictionFit} with
 * the warnings a careful engineer would add.
 */
final class FitReport {

    /** A resampling σ this many times the Jacobian's says the residuals are far from white. */
    private static final double DISAGREEMENT = 3;

    /** Integration tolerance of the refits' energy shares, which feed only their σ. */
    private static final double SHARE_TOLERANCE = 1e-6;

    private FitReport() {
    }

    static FrictionFit build(FrictionProblem problem, Set<FrictionTerm> terms, PointFit point, double[] resampled,
            int resamplesUsed, FitSettings settings) {
        return build(problem, terms, point, null, resampled, resamplesUsed, settings, null);
    }

    /**
     * The report of a fit.
     *
     * @param replicates the full vectors of the resampling refits (for the σ of the energy shares); may be
     *                   null when only their spread is known
     * @param resampled  standard deviation of each full entry over the refits, or null
     * @param floors     the records' noise floors when this is a reported fit, to be held against
     *                   them, given a verdict and a stop band; null for a candidate of a comparison
     */
    static FrictionFit build(FrictionProblem problem, Set<FrictionTerm> terms, PointFit point,
            List<double[]> replicates, double[] resampled, int resamplesUsed, FitSettings settings,
            List<NoiseFloor.Estimate> floors) {
        final boolean judge = floors != null;
        final StageOutcome o = point.outcome();
        final ParameterLayout layout = point.layout();
        final double[] full = o.full();
        final int n = problem.samples();
        final Uncertainty u = Uncertainty.of(o.jacobian(), layout, full, o.rss(), n, o.residuals());
        final List<FitWarning> warnings = new ArrayList<>();
        final FrictionTorques friction = friction(full, point.stiction());
        final List<ParameterEstimate> physical = new ArrayList<>();
        for (FrictionTerm term : terms) {
            if (term == FrictionTerm.STICTION) {
                physical.add(new ParameterEstimate(term.symbol(), term.unit(), friction.staticTorque(), Double.NaN, Double.NaN,
                        true, false));
            } else {
                physical.add(estimate(layout, indexOf(term), full, u, resampled));
            }
        }
        final int inertiaIndex = ParameterLayout.index(ParameterKind.INERTIA);
        final ParameterEstimate inertia = estimate(layout, inertiaIndex, full, u, resampled);
        physical.add(inertia);
        final MechanismProperties mechanism = problem.mechanism();
        final double difference = 100 * (full[inertiaIndex] - mechanism.pivotInertia()) / mechanism.pivotInertia();
        final InertiaCheck check = new InertiaCheck(mechanism.pivotInertia(), full[inertiaIndex], inertia.sigma(),
                difference, problem.inertiaFree());
        final List<SessionEstimate> sessions = new ArrayList<>();
        int row = 0;
        for (int s = 0; s < problem.sessions().size(); s++) {
            final int size = problem.sessions().get(s).size();
            double sum = 0;
            if (o.residuals() != null) {
                for (int i = row; i < row + size; i++) {
                    sum += o.residuals()[i] * o.residuals()[i];
                }
            }
            sessions.add(new SessionEstimate(problem.sessions().get(s).name(),
                    estimate(layout, ParameterLayout.index(s, ParameterKind.RELEASE_ANGLE), full, u, resampled),
                    estimate(layout, ParameterLayout.index(s, ParameterKind.RELEASE_TIME), full, u, resampled),
                    estimate(layout, ParameterLayout.index(s, ParameterKind.OFFSET), full, u, resampled),
                    o.residuals() == null ? Double.NaN : Math.sqrt(sum / size), size));
            row += size;
        }
        final double lag1 = o.residuals() == null ? Double.NaN : RecordSignals.lag1(o.residuals(), 0, n);
        final MechanismProperties level = StagedFit.level(mechanism);
        EnergyShares energy = o.status() == FitStatus.CANCELLED ? new EnergyShares(0, 0, 0, 0, null)
                : EnergyAccount.of(level, friction, full, problem.sessions(), settings.integrationTolerance());
        final List<double[]> shares = new ArrayList<>();
        if (judge && replicates != null && o.status() == FitStatus.CONVERGED) {
            // one simulation per refit; independent, so they run on all cores when allowed
            Stream<double[]> each = replicates.stream();
            if (settings.parallel()) {
                each = each.parallel();
            }
            // the spread of the shares needs them to a few parts in 1e5, not to the fit's tolerance
            final double coarse = Math.max(settings.integrationTolerance(), SHARE_TOLERANCE);
            shares.addAll(each.map(r -> {
                final EnergyShares e = EnergyAccount.of(level, friction(r, point.stiction()), r, problem.sessions(),
                        coarse);
                return new double[] {e.viscous(), e.coulomb(), e.drag()};
            }).toList());
            if (shares.size() >= 2) {
                final double[] sigma = BlockBootstrap.spread(shares, 3);
                energy = energy.withSigmas(sigma[0], sigma[1], sigma[2]);
            }
        }
        FitStatus status = o.status();
        String message = o.message();
        Goodness goodness = null;
        StictionBand stopBand = null;
        String stopNote = null;
        if (judge) {
            goodness = Goodness.of(problem.sessions(), floors, o.residuals(), settings.misfitRatio());
            if (status == FitStatus.CONVERGED && !goodness.passed()) {
                status = FitStatus.MISFIT;
                message = "the model does not describe the records: the residuals are clearly above the noise floor";
            }
            final StopBands.Found found = StopBands.of(problem, point, settings);
            stopBand = found.band();
            stopNote = found.note();
        }
        final FrictionVerdict verdict = FrictionVerdict.judge(energy, shares, settings.verdictMargin(),
                status == FitStatus.CONVERGED);
        warn(warnings, problem, point, u, physical, check, settings, resamplesUsed);
        for (int s = 0; s < point.data().size(); s++) {
            final EncoderRounding r = point.data().get(s).rounding();
            if (r != null) {
                warnings.add(new FitWarning(FitWarning.Kind.ENCODER_ROUNDING, String.format(Locale.ROOT, "%s: the"
                        + " record moves in encoder steps of %.3g° with noise of only %.2g° before rounding (estimated"
                        + " by maximum likelihood): the rounding is part of the fitted measurement model, which"
                        + " removes the bias plain least squares would have", problem.sessions().get(s).name(),
                        Math.toDegrees(r.step()), Math.toDegrees(r.sigma()))));
            }
        }
        if (goodness != null) {
            for (String line : goodness.evidence()) {
                warnings.add(new FitWarning(FitWarning.Kind.MISFIT, line + ": the model does not describe this"
                        + " record; likely causes: a loss law not in the model, a wrong inertia or centroid, a"
                        + " sensor fault, or a record that is not a free swing"));
            }
            if (goodness.aboveNoise()) {
                warnings.add(new FitWarning(FitWarning.Kind.ABOVE_NOISE, String.format(Locale.ROOT, "the residuals"
                        + " are up to %.3g times the noise floor: the model misses part of the motion (below the"
                        + " misfit limit %.3g, so the estimates stand, with care)", goodness.ratio(),
                        goodness.limit())));
            }
        }
        return new FrictionFit(status, message, List.copyOf(terms), friction, physical, check, point.band(),
                sessions, new CorrelationTable(u.names(), u.correlation()), energy, Math.sqrt(o.rss() / n), o.rss(),
                n, layout.freeCount(), lag1, resamplesUsed, warnings, settings, point.iterations(),
                point.evaluations(), verdict, goodness, stopBand, stopNote);
    }

    /** The friction torques of a full vector; a holding torque not above Tc means "as Tc". */
    static FrictionTorques friction(double[] full, double stiction) {
        final double tc = full[ParameterLayout.index(ParameterKind.COULOMB)];
        final double ts = stiction > tc ? stiction : 0;
        return new FrictionTorques(full[ParameterLayout.index(ParameterKind.VISCOUS)], tc, ts,
                full[ParameterLayout.index(ParameterKind.DRAG)]);
    }


    private static int indexOf(FrictionTerm term) {
        return switch (term) {
            case VISCOUS -> ParameterLayout.index(ParameterKind.VISCOUS);
            case COULOMB -> ParameterLayout.index(ParameterKind.COULOMB);
            case DRAG -> ParameterLayout.index(ParameterKind.DRAG);
            case STICTION -> throw new IllegalArgumentException("stiction is bracketed, not fitted");
        };
    }

    private static ParameterEstimate estimate(ParameterLayout layout, int i, double[] full, Uncertainty u,
            double[] resampled) {
        final boolean free = layout.isFree(i);
        return new ParameterEstimate(layout.name(i), layout.kind(i).unit(), full[i], u.sigma()[i],
                free && resampled != null ? resampled[i] : Double.NaN, free, free && layout.onBound(i, full[i]));
    }

    private static void warn(List<FitWarning> warnings, FrictionProblem problem, PointFit point, Uncertainty u,
            List<ParameterEstimate> physical, InertiaCheck check, FitSettings settings, int resamplesUsed) {
        final StageOutcome o = point.outcome();
        if (o.status() != FitStatus.CONVERGED) {
            warnings.add(new FitWarning(FitWarning.Kind.NOT_CONVERGED, "the fit did not converge (" + o.status()
                    + ": " + o.message() + "); the values are where it stopped, at RMS "
                    + format(Math.sqrt(o.rss() / problem.samples())) + " rad"));
        }
        for (ParameterEstimate p : physical) {
            if (p.onBound()) {
                warnings.add(new FitWarning(FitWarning.Kind.ON_BOUND, p.name().equals(ParameterKind.INERTIA.symbol())
                        ? "J0 sits on its bound m·Lc² = " + format(p.value()) + " kg·m²: mass or centroid distance are"
                                + " inconsistent with the records"
                        : p.name() + " sits on its bound 0: the records show no such loss; drop the term (its"
                                + " standard error is not meaningful)"));
            }
            if (!p.onBound() && !p.name().equals(ParameterKind.INERTIA.symbol())
                    && !p.name().equals(FrictionTerm.STICTION.symbol()) && !(p.value() > 2 * p.sigma())) {
                warnings.add(new FitWarning(FitWarning.Kind.NOT_CLEAR_OF_ZERO, p.name() + " = " + format(p.value())
                        + " " + p.unit() + " is within two standard errors (" + format(p.sigma()) + ") of zero: the"
                        + " records do not show this loss clearly; consider dropping the term"));
            }
            if (Double.isFinite(p.sigmaJacobian()) && p.sigmaResampling() > DISAGREEMENT * p.sigmaJacobian()) {
                warnings.add(new FitWarning(FitWarning.Kind.UNCERTAINTY_DISAGREEMENT, "the resampling σ of " + p.name()
                        + " (" + format(p.sigmaResampling()) + " " + p.unit() + ") is more than " + DISAGREEMENT
                        + " times the Jacobian's (" + format(p.sigmaJacobian())
                        + "): the residuals are correlated or the model misses something; quote the larger"));
            }
        }
        final double[][] r = u.correlation();
        for (int a = 0; a < r.length; a++) {
            for (int b = 0; b < a; b++) {
                final ParameterKind ka = point.layout().kind(u.indices()[a]);
                final ParameterKind kb = point.layout().kind(u.indices()[b]);
                if (Math.abs(r[a][b]) > settings.correlationLimit() && (ka.physical() || kb.physical())) {
                    warnings.add(new FitWarning(FitWarning.Kind.STRONG_CORRELATION,
                            correlationAdvice(u.names().get(a), ka, u.names().get(b), kb, r[a][b],
                                    problem.sessions().size())));
                }
            }
        }
        if (u.rankDeficient()) {
            warnings.add(new FitWarning(FitWarning.Kind.NOT_IDENTIFIABLE, "the Jacobian is nearly rank deficient:"
                    + " some parameter combination is not identifiable from these records"));
        }
        if (check.free() && Math.abs(check.differencePercent()) > settings.inertiaLimitPercent()) {
            warnings.add(new FitWarning(FitWarning.Kind.INERTIA_MISMATCH, "the fitted inertia "
                    + format(check.fitted()) + " kg·m² differs from the calculated " + format(check.calculated())
                    + " kg·m² by " + format(check.differencePercent()) + " % (limit "
                    + format(settings.inertiaLimitPercent()) + " %, common practice): check the parts list"));
        }
        if (settings.resamples() > 0 && resamplesUsed < settings.resamples() && o.status() == FitStatus.CONVERGED) {
            warnings.add(new FitWarning(FitWarning.Kind.RESAMPLING_INCOMPLETE, resamplesUsed + " of "
                    + settings.resamples() + " resampling refits converged"));
        }
        if (point.band() != null && !point.band().resolved()) {
            warnings.add(new FitWarning(FitWarning.Kind.STICTION_UNRESOLVED, "the sessions' stops need different"
                    + " static torques (no common band); Ts is set to " + format(point.stiction()) + " N·m"));
        }
    }

    /**
     * What a strong correlation means for the user: the standard errors already carry it, and
     * which further test would separate the two parameters.
     */
    static String correlationAdvice(String a, ParameterKind ka, String b, ParameterKind kb, double r, int sessions) {
        final String head = a + " and " + b + " correlate at " + format(r) + ": a change of one is partly"
                + " made up by the other, and their ± above already include this";
        final boolean inertia = ka == ParameterKind.INERTIA || kb == ParameterKind.INERTIA;
        if (inertia) {
            return head + "; to separate them, hold the inertia with --fix-inertia when the parts list is trusted,"
                    + " or add a release at a small amplitude (its period fixes the inertia)";
        }
        final boolean drag = ka == ParameterKind.DRAG || kb == ParameterKind.DRAG;
        final String test = drag
                ? "a release at a larger amplitude (drag grows with the square of the speed, the other term does"
                        + " not)"
                : "releases at clearly different amplitudes (dry friction takes a fixed angle per swing, viscous"
                        + " damping a fixed fraction)";
        return head + (sessions == 1 ? "; one record cannot separate them well: " : "; what separates them: ") + test
                + ", fitted jointly";
    }

    private static String format(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
