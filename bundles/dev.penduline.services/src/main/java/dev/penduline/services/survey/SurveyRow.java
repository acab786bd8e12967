package dev.penduline.services.survey;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * What the survey found for one unit: its records with their SHA-256, the fitted terms with σ
 * (SI), the verdict, the fitted pivot inertia, each record's residual against its noise floor,
 * the warnings; or, for a failed unit, the record that failed and why.
 *
 * @param key             the unit's key
 * @param files           its records as given
 * @param sha256s         each record's SHA-256 (empty for a record that could not be read)
 * @param status          {@link #FITTED} or {@link #FAILED}
 * @param terms           the terms of the fit kept (selected by the comparison, or as asked)
 * @param estimates       each term's value and σ, SI, in {@code terms} order
 * @param verdict         the dominant loss ("viscous", "coulomb", "drag"), "mixed", or "withheld", as fit says it
 * @param inertia         the fitted pivot inertia J0 (kg·m²; the calculated one with --fix-inertia)
 * @param inertiaSigma    its σ (kg·m²; 0 when held)
 * @param residualToNoise each record's residual rms over its noise floor, in {@code files} order
 * @param warnings        what reading and fitting found
 * @param failedFile      the record that failed (empty unless failed)
 * @param error           why it failed (empty unless failed)
 */
public record SurveyRow(String key, List<String> files, List<String> sha256s, String status, List<String> terms,
        List<Estimate> estimates, String verdict, double inertia, double inertiaSigma, List<Double> residualToNoise,
        List<String> warnings, String failedFile, String error) {

    /** The status of a unit that was fitted (the fit converged). */
    public static final String FITTED = "fitted";

    /** The status of a unit that could not be fitted. */
    public static final String FAILED = "failed";

    /**
     * A term's estimate.
     *
     * @param term  the term's word ("viscous", "coulomb", "stiction", "drag")
     * @param value the value, SI
     * @param sigma its standard uncertainty, SI
     */
    public record Estimate(String term, double value, double sigma) {
    }

    /** Copies the lists. */
    public SurveyRow {
        files = List.copyOf(files);
        sha256s = List.copyOf(sha256s);
        terms = List.copyOf(terms);
        estimates = List.copyOf(estimates);
        residualToNoise = List.copyOf(residualToNoise);
        warnings = List.copyOf(warnings);
    }

    /**
     * A failed unit's row.
     *
     * @param unit    the unit
     * @param sha256s the hashes read so far (may be fewer than the files)
     * @param file    the record that failed, or all of the unit's
     * @param error   why
     * @return the row
     */
    public static SurveyRow failed(SurveyUnit unit, List<String> sha256s, String file, String error) {
        return new SurveyRow(unit.key(), unit.files().stream().map(Object::toString).toList(), sha256s, FAILED, List.of(),
                List.of(), "", Double.NaN, Double.NaN, List.of(), List.of(), file, error);
    }

    /**
     * Whether the unit was fitted.
     *
     * @return true for {@link #FITTED}
     */
    public boolean fitted() {
        return FITTED.equals(status);
    }

    /**
     * A term's estimate.
     *
     * @param term the term's word
     * @return the estimate, or empty when the unit's fit has no such term
     */
    public Optional<Estimate> estimate(String term) {
        return estimates.stream().filter(e -> e.term().equals(term)).findFirst();
    }

    /**
     * The row as one line of tab-separated fields (no line end), read back by {@link #decode}:
     * doubles as Java writes them (they read back to the same bits), text escaped.
     *
     * @return the line
     */
    String encode() {
        List<String> f = new ArrayList<>();
        f.add(escape(key));
        f.add(list(files));
        f.add(list(sha256s));
        f.add(escape(status));
        f.add(list(terms));
        f.add(list(estimates.stream().map(e -> e.term() + "=" + e.value() + "=" + e.sigma()).toList()));
        f.add(escape(verdict));
        f.add(Double.toString(inertia));
        f.add(Double.toString(inertiaSigma));
        f.add(list(residualToNoise.stream().map(String::valueOf).toList()));
        f.add(list(warnings));
        f.add(escape(failedFile));
        f.add(escape(error));
        return String.join("\t", f);
    }

    /** How many fields {@link #encode} writes. */
    static final int FIELDS = 13;

    /**
     * Reads a row back from {@link #encode}'s fields.
     *
     * @param f the fields
     * @return the row
     * @throws IllegalArgumentException when the fields are not a row's
     */
    static SurveyRow decode(String[] f) {
        if (f.length != FIELDS) {
            throw new IllegalArgumentException("a row has " + FIELDS + " fields, not " + f.length);
        }
        List<Estimate> estimates = new ArrayList<>();
        for (String e : unlist(f[5])) {
            String[] p = e.split("=", -1);
            if (p.length != 3) {
                throw new IllegalArgumentException("not an estimate: " + e);
            }
            estimates.add(new Estimate(p[0], Double.parseDouble(p[1]), Double.parseDouble(p[2])));
        }
        return new SurveyRow(unescape(f[0]), unlist(f[1]), unlist(f[2]), unescape(f[3]), unlist(f[4]), estimates,
                unescape(f[6]), Double.parseDouble(f[7]), Double.parseDouble(f[8]),
                unlist(f[9]).stream().map(Double::valueOf).toList(), unlist(f[10]), unescape(f[11]), unescape(f[12]));
    }

    private static String list(List<String> items) {
        return String.join("|", items.stream().map(SurveyRow::escape).toList());
    }

    private static List<String> unlist(String field) {
        if (field.isEmpty()) {
            return List.of();
        }
        List<String> out = new ArrayList<>();
        for (String s : field.split("\\|", -1)) {
            out.add(unescape(s));
        }
        return out;
    }

    static String escape(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '\\' -> b.append("\\\\");
                case '\t' -> b.append("\\t");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '|' -> b.append("\\p");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    static String unescape(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '\\') {
                b.append(c);
                continue;
            }
            if (++i == s.length()) {
                throw new IllegalArgumentException("a lone backslash at the end");
            }
            b.append(switch (s.charAt(i)) {
                case '\\' -> '\\';
                case 't' -> '\t';
                case 'n' -> '\n';
                case 'r' -> '\r';
                case 'p' -> '|';
                default -> throw new IllegalArgumentException("unknown escape \\" + s.charAt(i));
            });
        }
        return b.toString();
    }
}
