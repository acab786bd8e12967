package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;

/**
 * Turns a point fit, its uncertainties and its energy account into a {@link FrictionFit} with
 * the warnings a careful engineer would add.
 */
final class FitReport {

    /** A resampling σ this many times the Jacobian's says the residuals are far from white. */
    private static final double DISAGREEMENT = 3;

    private FitReport() {
    }

    static FrictionFit build(FrictionProblem problem, Set<FrictionTerm> terms, PointFit point, double[] resampled,
            int resamplesUsed, FitSettings settings) {
        final StageOutcome o = point.outcome();
        final ParameterLayout layout = point.layout();
        final double[] full = o.full();
        final int n = problem.samples();
        final Uncertainty u = Uncertainty.of(o.jacobian(), layout, full, o.rss(), n);
        final List<FitWarning> warnings = new ArrayList<>();
        final double tc = full[ParameterLayout.index(ParameterKind.COULOMB)];
        final double ts = point.stiction() > tc ? point.stiction() : 0;
        final FrictionTorques friction = new FrictionTorques(full[0], tc, ts, full[2]);
        final List<ParameterEstimate> physical = new ArrayList<>();
        for (FrictionTerm term : terms) {
            if (term == FrictionTerm.STICTION) {
                physical.add(new ParameterEstimate("Ts", term.unit(), friction.staticTorque(), Double.NaN, Double.NaN,
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
                    estimate(layout, ParameterLayout.index(s, 0), full, u, resampled),
                    estimate(layout, ParameterLayout.index(s, 1), full, u, resampled),
                    estimate(layout, ParameterLayout.index(s, 2), full, u, resampled),
                    o.residuals() == null ? Double.NaN : Math.sqrt(sum / size), size));
            row += size;
        }
        final double lag1 = o.residuals() == null ? Double.NaN : RecordSignals.lag1(o.residuals(), 0, n);
        final EnergyShares energy = o.status() == FitStatus.CANCELLED ? new EnergyShares(0, 0, 0, 0, null)
                : EnergyAccount.of(StagedFit.level(mechanism), friction, full, problem.sessions(),
                        settings.integrationTolerance());
        warn(warnings, problem, point, u, physical, check, settings, resamplesUsed);
        return new FrictionFit(o.status(), o.message(), List.copyOf(terms), friction, physical, check, point.band(),
                sessions, new CorrelationTable(u.names(), u.correlation()), energy, Math.sqrt(o.rss() / n), o.rss(),
                n, layout.freeCount(), lag1, resamplesUsed, warnings, settings, point.iterations(),
                point.evaluations());
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
                warnings.add(new FitWarning(FitWarning.Kind.ON_BOUND, p.name().equals("J0")
                        ? "J0 sits on its bound m·Lc² = " + format(p.value()) + " kg·m²: mass or centroid distance are"
                                + " inconsistent with the records"
                        : p.name() + " sits on its bound 0: the records show no such loss; drop the term (its"
                                + " standard error is not meaningful)"));
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
                    String text = u.names().get(a) + " and " + u.names().get(b) + " correlate at "
                            + format(r[a][b]) + ": the records hardly tell them apart";
                    if (problem.sessions().size() == 1 && friction(ka) && friction(kb)) {
                        text += "; releases at different amplitudes are what separate viscous from dry friction:"
                                + " record more sessions and fit them jointly";
                    }
                    warnings.add(new FitWarning(FitWarning.Kind.STRONG_CORRELATION, text));
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

    private static boolean friction(ParameterKind kind) {
        return kind == ParameterKind.VISCOUS || kind == ParameterKind.COULOMB || kind == ParameterKind.DRAG;
    }

    private static String format(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
