package dev.penduline.physics.identify;

import java.util.List;
import java.util.Optional;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * The outcome of one identification: estimates with both uncertainties, the inertia check,
 * per-session nuisance parameters and residuals, correlations, the energy account and the
 * warnings. Immutable, plain values, ready to be written out or stored.
 *
 * @param status         how the fit ended; only {@link FitStatus#CONVERGED} results are estimates
 * @param message        what happened, in a sentence (the optimiser's complaint when not converged)
 * @param terms          the friction terms fitted
 * @param friction       the fitted b, Tc, Ts, c (terms not fitted are zero; Ts = 0 means "as Tc")
 * @param parameters     the physical estimates: the fitted friction terms, then J0
 * @param inertia        fitted against calculated inertia
 * @param stiction       the band of static torque consistent with the stops, or null when
 *                       stiction was not fitted
 * @param sessions       nuisance parameters and residual per session
 * @param correlation    correlations of all free parameters not on a bound
 * @param energy         shares of the dissipated energy at the fitted parameters
 * @param rms            root-mean-square residual over all samples (rad)
 * @param residualSumOfSquares sum of squared residuals (rad²)
 * @param samples        number of samples fitted
 * @param freeParameters number of parameters the optimiser moved (physical and nuisance)
 * @param residualLag1   lag-1 autocorrelation of the residuals (white noise: near 0)
 * @param resamplesUsed  successful block-bootstrap refits behind the resampling σ
 * @param warnings       what to be careful about
 * @param settings       the settings used
 * @param iterations     optimiser iterations over all stages
 * @param evaluations    model evaluations over all stages (resampling excluded)
 * @param verdict        which loss dominates, or mixed, or withheld
 * @param goodness       the residuals against the records' noise floors
 * @param stopBand       the static-friction band the records' stops allow, whatever the term set;
 *                       null when none can be given ({@code stopNote} says why)
 * @param stopNote       how the stop band was found, or why there is none
 */
public record FrictionFit(FitStatus status, String message, List<FrictionTerm> terms, FrictionTorques friction,
        List<ParameterEstimate> parameters, InertiaCheck inertia, StictionBand stiction,
        List<SessionEstimate> sessions, CorrelationTable correlation, EnergyShares energy, double rms,
        double residualSumOfSquares, int samples, int freeParameters, double residualLag1, int resamplesUsed,
        List<FitWarning> warnings, FitSettings settings, int iterations, int evaluations, FrictionVerdict verdict,
        Goodness goodness, StictionBand stopBand, String stopNote) {

    /**
     * Freezes the lists.
     */
    public FrictionFit {
        terms = List.copyOf(terms);
        parameters = List.copyOf(parameters);
        sessions = List.copyOf(sessions);
        warnings = List.copyOf(warnings);
    }

    /**
     * Whether the optimiser converged.
     *
     * @return true for {@link FitStatus#CONVERGED}
     */
    public boolean converged() {
        return status == FitStatus.CONVERGED;
    }

    /**
     * A physical estimate by name (b, Tc, Ts, c, J0).
     *
     * @param name the parameter's symbol
     * @return the estimate, if fitted
     */
    public Optional<ParameterEstimate> parameter(String name) {
        return parameters.stream().filter(p -> p.name().equals(name)).findFirst();
    }

    /**
     * Whether a warning of the given kind was raised.
     *
     * @param kind the kind of warning
     * @return true when present
     */
    public boolean hasWarning(FitWarning.Kind kind) {
        return warnings.stream().anyMatch(w -> w.kind() == kind);
    }
}
