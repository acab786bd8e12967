package dev.penduline.services;

import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

import dev.penduline.model.EnergyShare;
import dev.penduline.model.Estimate;
import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.model.PendulineFactory;
import dev.penduline.model.SessionFit;
import dev.penduline.model.Setting;
import dev.penduline.model.TermSetScore;
import dev.penduline.model.TestSession;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.physics.identify.CandidateScore;
import dev.penduline.physics.identify.CorrelationTable;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FitWarning;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.FrictionVerdict;
import dev.penduline.physics.identify.Goodness;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.physics.identify.SessionEstimate;

/**
 * Stores a friction fit in the mechanism file it belongs to: the sessions and terms used, the
 * estimates with both standard errors, the correlations, fitted against calculated inertia,
 * each session's nuisance values, the comparison of term sets, the dominant loss with the
 * energy shares, the settings, and when it was computed (the file's only timestamp).
 */
public final class FitRecorder {

    /** The setting that holds the verdict sentence, as {@link FitWording#verdict} wrote it. */
    public static final String VERDICT = "verdict";

    private FitRecorder() {
    }

    /**
     * Appends the fit to the mechanism file and saves it atomically (notes of the save dropped).
     *
     * @param mechanismFile the mechanism file
     * @param outcome       the fit
     * @param computedAt    when it was computed
     * @return the stored result's identifier
     * @throws InputException when the file cannot be read, locked or saved
     */
    public static String store(Path mechanismFile, FrictionIdentification.Outcome outcome, Instant computedAt)
            throws InputException {
        return store(mechanismFile, outcome, computedAt, note -> { });
    }

    /**
     * Appends the fit to the mechanism file and saves it atomically. The fit is added to the
     * file's content at the moment of saving, under the file's lock (see
     * {@link MechanismStore#update}): a fit or a session stored meanwhile by another writer is kept.
     *
     * @param mechanismFile the mechanism file
     * @param outcome       the fit
     * @param computedAt    when it was computed
     * @param notes         receives notes of the save for the user
     * @return the stored result's identifier
     * @throws InputException when the file cannot be read, locked or saved
     */
    public static String store(Path mechanismFile, FrictionIdentification.Outcome outcome, Instant computedAt,
            Consumer<String> notes) throws InputException {
        return MechanismStore.update(mechanismFile, m -> addTo(m, outcome, computedAt), notes);
    }

    /**
     * Appends the fit to the mechanism file it was computed from and saves it atomically, unless
     * the file changed since it was read: then nothing is written and the other writer's change
     * is kept (see {@link MechanismStore#update(MechanismSnapshot, MechanismStore.Change, Consumer, String)}).
     *
     * @param read       the mechanism file as read for the fit
     * @param outcome    the fit
     * @param computedAt when it was computed
     * @param notes      receives notes of the save for the user
     * @return the stored result's identifier
     * @throws InputException naming the file when it changed since it was read, or cannot be
     *                        locked or saved
     */
    public static String store(MechanismSnapshot read, FrictionIdentification.Outcome outcome, Instant computedAt,
            Consumer<String> notes) throws InputException {
        return MechanismStore.update(read, m -> addTo(m, outcome, computedAt), notes,
                "fit again to store a fit of the new content");
    }

    /**
     * Adds the fit to a mechanism in memory, as {@link #store} adds it to the file's content: the
     * workbench runs this inside one undoable command on an open document.
     *
     * @param m          the mechanism
     * @param outcome    the fit
     * @param computedAt when it was computed
     * @return the added result's identifier
     */
    public static String addTo(Mechanism m, FrictionIdentification.Outcome outcome, Instant computedAt) {
        String when = computedAt.truncatedTo(ChronoUnit.SECONDS).toString();
        FitResult r = NamedElements.addFitResult(m, "Fit " + when, when);
        fill(r, outcome);
        keepFittedContent(m, outcome);
        return r.getId();
    }

    /**
     * The fit was made on the records' content as read: a session whose record changed (and was
     * accepted, see {@link FrictionIdentification#sessionsOf(Path, MechanismSource, boolean)}) gets
     * that content's hash, so the stored fit and the stored hash agree.
     */
    private static void keepFittedContent(Mechanism m, FrictionIdentification.Outcome outcome) {
        for (FrictionIdentification.SessionInput s : outcome.sessions()) {
            if (s.change() == null) {
                continue;
            }
            for (TestSession t : m.getSessions()) {
                if (t.getId() != null && t.getId().equals(s.sessionId())) {
                    t.setContentHash(s.record().sha256());
                }
            }
        }
    }

    private static void fill(FitResult r, FrictionIdentification.Outcome outcome) {
        FrictionFit fit = outcome.fit();
        PendulineFactory f = PendulineFactory.eINSTANCE;
        for (FrictionIdentification.SessionInput s : outcome.sessions()) {
            r.getSessionIds().add(s.sessionId() != null ? s.sessionId() : s.file());
        }
        for (FrictionTerm t : fit.terms()) {
            r.getTermIds().add(t.word());
        }
        for (ParameterEstimate p : fit.parameters()) {
            Estimate e = f.createEstimate();
            e.setParameter(p.name());
            e.setValue(p.value());
            if (Double.isFinite(p.sigmaJacobian())) {
                e.setStandardError(p.sigmaJacobian());
            }
            if (Double.isFinite(p.sigmaResampling())) {
                e.setResamplingError(p.sigmaResampling());
            }
            r.getEstimates().add(e);
        }
        CorrelationTable c = fit.correlation();
        if (c != null) {
            r.getCorrelationParameters().addAll(c.names());
            for (double[] row : c.values()) {
                for (double v : row) {
                    r.getCorrelations().add(Double.isFinite(v) ? v : 0);
                }
            }
        }
        if (fit.inertia() != null) {
            r.setCalculatedInertia(fit.inertia().calculated());
            r.setFittedInertia(fit.inertia().fitted());
        }
        for (SessionEstimate s : fit.sessions()) {
            SessionFit sf = f.createSessionFit();
            sf.setSessionId(sessionId(outcome, s.name()));
            sf.setInitialAngle(s.releaseAngle().value());
            sf.setReleaseTime(s.releaseTime().value());
            sf.setAngleOffset(s.offset().value());
            sf.setRmsResidual(s.rms());
            r.getSessionFits().add(sf);
        }
        outcome.comparison().ifPresent(cmp -> {
            for (CandidateScore score : cmp.candidates()) {
                TermSetScore t = f.createTermSetScore();
                for (FrictionTerm term : score.terms()) {
                    t.getTermIds().add(term.word());
                }
                t.setAic(score.aic());
                t.setBic(score.bic());
                t.setRmsResidual(score.rms());
                r.getComparisons().add(t);
            }
        });
        if (fit.energy() != null) {
            // the verdict, not merely the largest share: "mixed" when no loss leads clearly
            r.setDominantLoss(fit.verdict().kind() == FrictionVerdict.Kind.DOMINANT
                    ? fit.verdict().dominant().word() : "mixed");
            share(r, FrictionTerm.VISCOUS.word(), fit.energy().viscous());
            share(r, FrictionTerm.COULOMB.word(), fit.energy().coulomb());
            share(r, FrictionTerm.DRAG.word(), fit.energy().drag());
        }
        FitSettings s = fit.settings();
        setting(r, "terms", outcome.automatic() ? "auto" : "given");
        setting(r, "inertia", fit.inertia() != null && fit.inertia().free() ? "free" : "fixed");
        setting(r, "status", fit.status().name().toLowerCase(Locale.ROOT));
        setting(r, "max-iterations", String.valueOf(s.maxIterations()));
        setting(r, "max-evaluations", String.valueOf(s.maxEvaluations()));
        setting(r, "integration-tolerance", String.valueOf(s.integrationTolerance()));
        setting(r, "resamples", String.valueOf(fit.resamplesUsed()));
        setting(r, "seed", String.valueOf(s.seed()));
        setting(r, "verdict-margin", String.valueOf(s.verdictMargin()));
        if (fit.goodness() != null) {
            setting(r, "noise-ratio", String.valueOf(fit.goodness().ratio()));
        }
        if (fit.stopBand() != null) {
            setting(r, "stop-band", fit.stopBand().lower() + ".." + fit.stopBand().upper());
        }
        evidence(r, outcome);
        // the fit's warnings, then the records' (the order of `penduline fit`'s report and JSON)
        List<String> warnings = new ArrayList<>(fit.warnings().stream().map(FitWarning::message).toList());
        warnings.addAll(outcome.warnings());
        for (int i = 0; i < warnings.size(); i++) {
            setting(r, "warning-" + (i + 1), warnings.get(i));
        }
    }

    /**
     * What a report of the stored fit needs beyond the estimates, so that it says what
     * {@code penduline fit} said without fitting again: the verdict in words, the energy dissipated
     * and the shares' standard deviations, the fit against the noise floor of each record, the stop's
     * note, the totals. Stored as further settings (the file's schema is unchanged: a file written
     * before these keys existed still loads, and a report of it says what was not stored).
     */
    private static void evidence(FitResult r, FrictionIdentification.Outcome outcome) {
        FrictionFit fit = outcome.fit();
        if (fit.energy() != null) {
            setting(r, VERDICT, FitWording.verdict(fit));
            setting(r, "energy-dissipated", String.valueOf(fit.energy().dissipated()));
            setting(r, "energy-sigma-viscous", String.valueOf(fit.energy().viscousSigma()));
            setting(r, "energy-sigma-coulomb", String.valueOf(fit.energy().coulombSigma()));
            setting(r, "energy-sigma-drag", String.valueOf(fit.energy().dragSigma()));
        }
        setting(r, "rms-residual", String.valueOf(fit.rms()));
        setting(r, "samples", String.valueOf(fit.samples()));
        Goodness g = fit.goodness();
        if (g != null) {
            setting(r, "noise-floor", String.valueOf(g.floor()));
            setting(r, "noise-limit", String.valueOf(g.limit()));
            setting(r, "noise-passed", String.valueOf(g.passed()));
            for (int k = 0; k < g.sessions().size() && k < fit.sessions().size(); k++) {
                String id = sessionId(outcome, fit.sessions().get(k).name());
                Goodness.SessionGoodness sg = g.sessions().get(k);
                setting(r, "noise-floor[" + id + "]", String.valueOf(sg.noise().sigma()));
                setting(r, "residual-to-noise[" + id + "]", String.valueOf(sg.ratio()));
            }
        }
        if (fit.stopNote() != null) {
            setting(r, "stop-note", fit.stopNote());
        }
    }

    private static String sessionId(FrictionIdentification.Outcome outcome, String name) {
        for (FrictionIdentification.SessionInput s : outcome.sessions()) {
            if (s.name().equals(name)) {
                return s.sessionId() != null ? s.sessionId() : s.file();
            }
        }
        return name;
    }

    private static void share(FitResult r, String term, double value) {
        EnergyShare e = PendulineFactory.eINSTANCE.createEnergyShare();
        e.setTermId(term);
        e.setShare(value);
        r.getEnergyShares().add(e);
    }

    private static void setting(FitResult r, String key, String value) {
        Setting s = PendulineFactory.eINSTANCE.createSetting();
        s.setKey(key);
        s.setValue(value);
        r.getSettings().add(s);
    }
}
