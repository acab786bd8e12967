package dev.penduline.services;

import java.util.ArrayList;
import java.util.List;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.SessionEstimate;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * The fitted model beside each record of a fit, for plotting: the fit's own measurement model
 * {@code θ(t) = offset + x(t − t_r)}, where x is the swing released from rest at θ0 (held before
 * the release time t_r) with the fitted friction and inertia, simulated at every sample of the
 * record (the fit itself may have used a thinned record), and the residuals, measured minus
 * model.
 */
public final class FitCurves {

    /**
     * One session's record with the fitted model.
     *
     * @param session   the session's name
     * @param times     the record's times (s)
     * @param measured  the measured angles (rad, sensor frame)
     * @param modelled  the fitted model at those times (rad)
     * @param residuals measured minus modelled (rad)
     */
    public record Curve(String session, double[] times, double[] measured, double[] modelled, double[] residuals) {
    }

    private FitCurves() {
    }

    /**
     * The curves of every session of a fit, in the fit's order.
     *
     * @param outcome the fit
     * @return one curve per session
     */
    public static List<Curve> of(FrictionIdentification.Outcome outcome) {
        FrictionFit fit = outcome.fit();
        MechanismProperties level = FrictionIdentification.aboutEquilibrium(outcome.mechanism().properties());
        if (fit.inertia() != null && fit.inertia().free() && Double.isFinite(fit.inertia().fitted())) {
            level = level.withPivotInertia(fit.inertia().fitted());
        }
        SwingSimulator simulator = new SwingSimulator(level, fit.friction())
                .withTolerance(fit.settings().integrationTolerance());
        List<Curve> curves = new ArrayList<>();
        for (int s = 0; s < outcome.sessions().size() && s < fit.sessions().size(); s++) {
            SessionEstimate e = fit.sessions().get(s);
            curves.add(replay(simulator, e.name(), e.releaseAngle().value(), e.releaseTime().value(), e.offset().value(),
                    outcome.sessions().get(s).record().times(), outcome.sessions().get(s).record().angles()));
        }
        return curves;
    }

    /**
     * The simulator of a fit stored in a mechanism file: the mechanism about its equilibrium, with
     * the fitted pivot inertia when the fit freed it, and the stored friction torques.
     *
     * @param mechanism the mechanism the fit belongs to
     * @param fit       the stored fit
     * @param tolerance the integration tolerance (the stored fit's setting, or the default)
     * @return the simulator
     */
    public static SwingSimulator simulatorOf(MechanismSource mechanism, StoredFit fit, double tolerance) {
        MechanismProperties level = FrictionIdentification.aboutEquilibrium(mechanism.properties());
        if (Double.isFinite(fit.fittedInertia())) {
            level = level.withPivotInertia(fit.fittedInertia());
        }
        return new SwingSimulator(level, fit.friction()).withTolerance(tolerance);
    }

    /**
     * The model of one record from a session's fitted values, as the fit's measurement model has it.
     *
     * @param simulator the fit's simulator ({@link #simulatorOf})
     * @param session   the session's name
     * @param theta0    the fitted release angle from the equilibrium (rad)
     * @param release   the fitted release time on the record's time base (s)
     * @param offset    the fitted sensor offset (rad)
     * @param t         the record's times (s)
     * @param y         the record's angles (rad, sensor frame)
     * @return the curve
     */
    public static Curve replay(SwingSimulator simulator, String session, double theta0, double release, double offset,
            double[] t, double[] y) {
        int n = t.length;
        int first = 0;
        while (first < n && t[first] - release <= 0) {
            first++;
        }
        double[] model = new double[n];
        for (int i = 0; i < first; i++) {
            model[i] = offset + theta0;
        }
        if (first < n) {
            double[] tau = new double[n - first];
            for (int i = 0; i < tau.length; i++) {
                tau[i] = t[first + i] - release;
            }
            SwingRun run = simulator.simulate(theta0, 0, tau);
            double[] x = run.angles();
            for (int i = 0; i < tau.length; i++) {
                model[first + i] = offset + x[i];
            }
        }
        double[] residuals = new double[n];
        for (int i = 0; i < n; i++) {
            residuals[i] = y[i] - model[i];
        }
        return new Curve(session, t.clone(), y.clone(), model, residuals);
    }
}
