package dev.penduline.services;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import dev.penduline.model.EnergyShare;
import dev.penduline.model.Estimate;
import dev.penduline.model.FitResult;
import dev.penduline.model.SessionFit;
import dev.penduline.model.Setting;
import dev.penduline.model.TermSetScore;
import dev.penduline.model.TestSession;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.present.Figures;

/**
 * One friction fit as it is stored in a mechanism file, turned into the text the Friction view
 * shows: nothing is fitted or estimated here, every number comes from the stored
 * {@code FitResult}; only units are converted (radians to degrees) for display. Built off the
 * UI thread; holds no widgets.
 *
 * @param id          the stored result's identifier
 * @param computedAt  when it was computed (ISO-8601 instant, as stored)
 * @param status      how the fit ended ("converged" for every stored fit so far)
 * @param verdict     the dominant loss and its share of the dissipated energy
 * @param shares      every term's share of the dissipated energy
 * @param model       the terms fitted and how they were chosen
 * @param estimates   the friction terms and the inertia, with both standard errors
 * @param sessions    each record's release values and residual
 * @param comparisons the candidate term sets, in the order they were compared
 * @param warnings    the fit's warnings, in their stored order
 * @param noise       the fit against the records' noise floor in one sentence, empty when not stored
 * @param stopBand    the static friction the stops allow in one sentence, empty when not stored
 * @param totals      residual rms and sample count in one sentence, empty when not stored
 * @param settings    the stored settings, except the warnings and the evidence above, in stored order
 */
public record StoredFitText(String id, String computedAt, String status, String verdict, String shares, String model,
        List<EstimateRow> estimates, List<SessionRow> sessions, List<ComparisonRow> comparisons,
        List<String> warnings, String noise, String stopBand, String totals, List<Map.Entry<String, String>> settings) {

    /** The quantity of the row of the calculated J0 beside a fitted one. */
    public static final String CALCULATED = "J0 calculated";

    /** The quantity of the row of the calculated J0 a fit held fixed. */
    public static final String HELD = "J0 held at calculated";

    /** The quantity of the row of the fitted J0's difference from the calculated one, in percent. */
    public static final String DIFFERENCE = "J0 difference";

    /** What a report says where a fit was stored before Penduline kept that part of it. */
    public static final String NOT_STORED = "not stored with this fit";

    /** The settings that hold evidence shown in sentences of their own, not in the settings' list. */
    private static final Pattern EVIDENCE = Pattern.compile("verdict"
            + "|energy-.*|rms-residual|samples|noise-floor.*|noise-limit|noise-passed|noise-ratio|residual-to-noise.*"
            + "|stop-band|stop-note");

    /**
     * One line of the estimates table.
     *
     * @param quantity        what it is ("viscous", "J0 calculated", ...)
     * @param symbol          the parameter's symbol (b, Tc, Ts, c, J0), empty for derived rows
     * @param value           the value, rounded to the decimal place of {@code sigma} (GUM §7.2.6)
     * @param sigma           the larger of the two standard errors, the one to quote
     * @param sigmaJacobian   the standard error from the Jacobian at the optimum
     * @param sigmaResampling the standard error from the block bootstrap
     * @param unit            the SI unit of value and errors
     * @param measured        value and σ together as a report writes them ({@code Figures.measured}); for a
     *                        derived row, the value
     */
    public record EstimateRow(String quantity, String symbol, String value, String sigma, String sigmaJacobian,
            String sigmaResampling, String unit, String measured) {
    }

    /**
     * One line of the sessions table.
     *
     * @param session     the session's name in the mechanism file
     * @param releaseAngle fitted release angle (°)
     * @param releaseTime fitted release time on the record's time base (s)
     * @param offset      fitted sensor offset (°)
     * @param rms         root-mean-square residual (°)
     * @param noiseFloor  the record's noise floor (°), "–" when not stored
     * @param ratio       residual rms to noise floor (the misfit test's ratio), "–" when not stored
     */
    public record SessionRow(String session, String releaseAngle, String releaseTime, String offset, String rms,
            String noiseFloor, String ratio) {
    }

    /**
     * One line of the comparison table.
     *
     * @param selected whether this is the term set the stored result kept
     * @param terms    the candidate's terms joined by "+"
     * @param aic      Akaike's criterion (dimensionless)
     * @param bic      Schwarz's criterion (dimensionless)
     * @param rms      root-mean-square residual (°)
     */
    public record ComparisonRow(boolean selected, String terms, String aic, String bic, String rms) {
    }

    /** Freezes the lists. */
    public StoredFitText {
        estimates = List.copyOf(estimates);
        sessions = List.copyOf(sessions);
        comparisons = List.copyOf(comparisons);
        warnings = List.copyOf(warnings);
        settings = List.copyOf(settings);
    }

    /**
     * Reads a stored result.
     *
     * @param r        the stored result
     * @param sessions the mechanism's test sessions, to name the fitted ones
     * @return what the view shows of it
     */
    public static StoredFitText of(FitResult r, List<TestSession> sessions) {
        Map<String, String> settings = new HashMap<>();
        TreeMap<Integer, String> warnings = new TreeMap<>();
        List<Map.Entry<String, String>> plain = new ArrayList<>();
        for (Setting s : r.getSettings()) {
            settings.put(s.getKey(), s.getValue());
            if (s.getKey() != null && s.getKey().matches("warning-\\d{1,9}")) {
                warnings.put(Integer.parseInt(s.getKey().substring("warning-".length())), s.getValue());
            } else if (s.getKey() != null && !EVIDENCE.matcher(s.getKey()).matches()) {
                plain.add(Map.entry(s.getKey(), String.valueOf(s.getValue())));
            }
        }
        String model = "model: " + String.join("+", r.getTermIds())
                + ("auto".equals(settings.get("terms")) ? " (chosen by BIC among the candidates)" : " (as asked)");
        return new StoredFitText(r.getId(), String.valueOf(r.getComputedAt()), settings.getOrDefault("status", "unknown"),
                verdict(r, settings), shares(r, settings), model, estimates(r, "free".equals(settings.get("inertia"))),
                sessionRows(r, sessions, settings), comparisons(r), warningsOf(r, warnings.values()), noise(settings),
                stopBand(settings), totals(settings), plain);
    }

    private static double number(Map<String, String> settings, String key) {
        String v = settings.get(key);
        return v == null ? Double.NaN : parse(v);
    }

    private static String noise(Map<String, String> settings) {
        double floor = number(settings, "noise-floor");
        double rms = number(settings, "rms-residual");
        if (!Double.isFinite(floor) || !Double.isFinite(rms)) {
            return "";
        }
        // the residuals' lag-1 correlation is not stored: the sentence leaves it out
        return FitWording.againstNoise(rms, floor, number(settings, "noise-ratio"), number(settings, "noise-limit"),
                Double.NaN, "true".equals(settings.get("noise-passed")));
    }

    private static String stopBand(Map<String, String> settings) {
        String note = settings.get("stop-note");
        String band = settings.get("stop-band");
        String[] ends = band == null ? new String[0] : band.split("\\.\\.", 2);
        if (ends.length != 2) {
            return note == null ? "" : FitWording.stopBand(Double.NaN, Double.NaN, note);
        }
        return FitWording.stopBand(parse(ends[0]), parse(ends[1]), note);
    }

    private static double parse(String v) {
        try {
            return Double.parseDouble(v.trim());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private static String totals(Map<String, String> settings) {
        double rms = number(settings, "rms-residual");
        String samples = settings.get("samples");
        if (!Double.isFinite(rms) || samples == null) {
            return "";
        }
        return "Residual rms " + Figures.significant(Unit.DEGREE.fromSi(rms)) + "° over " + samples + " samples; "
                + settings.getOrDefault("resamples", "no") + " bootstrap refits.";
    }

    /** The stored warnings, after the stale mark when the parts changed after the fit. */
    private static List<String> warningsOf(FitResult r, Collection<String> stored) {
        List<String> all = new ArrayList<>();
        PartsImport.staleReason(r).ifPresent(why -> all.add("STALE: " + why + ". Fit again for results that match the"
                + " mechanism as it is now."));
        all.addAll(stored);
        return List.copyOf(all);
    }

    /**
     * The label of this result in the list of stored fits.
     *
     * @return the time and the terms
     */
    public String label() {
        return computedAt.replace('T', ' ').replace("Z", " UTC") + "  " + model.substring("model: ".length())
                .replaceFirst(" \\(.*", "");
    }

    /**
     * The row of a parameter.
     *
     * @param symbol b, Tc, Ts, c or J0
     * @return the row, if the fit has that parameter
     */
    public Optional<EstimateRow> estimate(String symbol) {
        return estimates.stream().filter(e -> e.symbol().equals(symbol)).findFirst();
    }

    private static String verdict(FitResult r, Map<String, String> settings) {
        String sentence = settings.get(FitRecorder.VERDICT);
        if (sentence != null) {
            return "Verdict: " + sentence;
        }
        String dominant = r.getDominantLoss();
        if (dominant == null) {
            return "Verdict: " + NOT_STORED;
        }
        if ("mixed".equals(dominant)) {
            return "Verdict: " + FitWording.MIXED_LEAD + "a clear margin (see the shares)";
        }
        double share = shareOf(r, FrictionTerm.STICTION.word().equals(dominant) ? FrictionTerm.COULOMB.word() : dominant);
        return "Verdict: " + FitWording.dominance(lossName(dominant), Figures.percent(share, 0));
    }

    private static String shares(FitResult r, Map<String, String> settings) {
        if (r.getEnergyShares().isEmpty()) {
            return "";
        }
        double dissipated = number(settings, "energy-dissipated");
        return "Energy dissipated: " + r.getEnergyShares().stream()
                .map(e -> TermWords.word(e.getTermId()) + " " + FitWording.percent(e.getShare(),
                        number(settings, "energy-sigma-" + e.getTermId())))
                .collect(Collectors.joining(", ")) + (Double.isFinite(dissipated)
                        ? " of " + Figures.significant(dissipated) + " J" : "");
    }

    /**
     * The standard deviation of a term's energy share, as stored.
     *
     * @param r      the stored result
     * @param termId "viscous", "coulomb" or "drag"
     * @return the σ (fraction), NaN when not stored
     */
    public static double shareSigma(FitResult r, String termId) {
        for (Setting s : r.getSettings()) {
            if (("energy-sigma-" + termId).equals(s.getKey())) {
                return parse(s.getValue());
            }
        }
        return Double.NaN;
    }

    private static double shareOf(FitResult r, String term) {
        return r.getEnergyShares().stream().filter(e -> term.equals(e.getTermId())).mapToDouble(EnergyShare::getShare)
                .findFirst().orElse(Double.NaN);
    }

    private static String lossName(String term) {
        for (FrictionTerm t : FrictionTerm.values()) {
            if (FitWording.word(t).equals(term)) {
                return FitWording.lossName(t);
            }
        }
        return term;
    }

    private static List<EstimateRow> estimates(FitResult r, boolean inertiaFree) {
        List<EstimateRow> rows = new ArrayList<>();
        for (Estimate e : r.getEstimates()) {
            boolean inertia = TermWords.INERTIA_SYMBOL.equals(e.getParameter());
            if (inertia && !inertiaFree) {
                continue;
            }
            double sj = e.isSetStandardError() ? e.getStandardError() : Double.NaN;
            double sr = e.isSetResamplingError() ? e.getResamplingError() : Double.NaN;
            // The quoted σ follows the physics layer's rule (ParameterEstimate.sigma), not one of ours.
            double sigma = new ParameterEstimate(e.getParameter(), "", e.getValue(), sj, sr, true, false).sigma();
            double quoted = Double.isFinite(sigma) ? sigma : Double.NaN;
            rows.add(new EstimateRow(inertia ? "inertia, fitted" : TermWords.quantity(e.getParameter()),
                    e.getParameter(), Figures.value(e.getValue(), quoted), orDash(sigma), orDash(sj), orDash(sr),
                    TermWords.unit(e.getParameter()), Figures.measured(e.getValue(), quoted)));
        }
        if (r.isSetCalculatedInertia()) {
            String unit = Unit.KG_M2.symbol();
            String calculated = Figures.significant(r.getCalculatedInertia());
            rows.add(new EstimateRow(inertiaFree ? CALCULATED : HELD, "", calculated, "", "", "", unit, calculated));
            if (inertiaFree && r.isSetFittedInertia()) {
                double difference = (r.getFittedInertia() - r.getCalculatedInertia()) / r.getCalculatedInertia();
                String d = (difference >= 0 ? "+" : "") + Figures.fixed(100 * difference, 2);
                rows.add(new EstimateRow(DIFFERENCE, "", d, "", "", "", "%", d));
            }
        }
        return rows;
    }

    private static String orDash(double sigma) {
        return Double.isFinite(sigma) ? Figures.uncertainty(sigma) : "–";
    }

    private static List<SessionRow> sessionRows(FitResult r, List<TestSession> sessions, Map<String, String> settings) {
        Map<String, String> names = new HashMap<>();
        for (TestSession s : sessions) {
            names.put(s.getId(), s.getName());
        }
        List<SessionRow> rows = new ArrayList<>();
        for (SessionFit s : r.getSessionFits()) {
            double floor = number(settings, "noise-floor[" + s.getSessionId() + "]");
            double ratio = number(settings, "residual-to-noise[" + s.getSessionId() + "]");
            rows.add(new SessionRow(names.getOrDefault(s.getSessionId(), String.valueOf(s.getSessionId())),
                    Figures.significant(Unit.DEGREE.fromSi(s.getInitialAngle())),
                    Figures.significant(s.getReleaseTime()),
                    Figures.significant(Unit.DEGREE.fromSi(s.getAngleOffset())),
                    Figures.significant(Unit.DEGREE.fromSi(s.getRmsResidual())),
                    Double.isFinite(floor) ? Figures.significant(Unit.DEGREE.fromSi(floor)) : "–",
                    Double.isFinite(ratio) ? Figures.fixed(ratio, 2) : "–"));
        }
        return rows;
    }

    private static List<ComparisonRow> comparisons(FitResult r) {
        Set<String> kept = new HashSet<>(r.getTermIds());
        List<ComparisonRow> rows = new ArrayList<>();
        for (TermSetScore s : r.getComparisons()) {
            rows.add(new ComparisonRow(kept.equals(new HashSet<>(s.getTermIds())),
                    s.getTermIds().stream().map(t -> t.toLowerCase(Locale.ROOT)).collect(Collectors.joining("+")),
                    Figures.fixed(s.getAic(), 1), Figures.fixed(s.getBic(), 1),
                    Figures.significant(Unit.DEGREE.fromSi(s.getRmsResidual()))));
        }
        return rows;
    }
}
