package dev.penduline.cli;

import static dev.penduline.cli.JsonTree.at;
import static dev.penduline.cli.JsonTree.has;
import static dev.penduline.cli.JsonTree.number;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;
import java.util.zip.GZIPInputStream;

import org.hipparchus.special.Erf;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Penduline's real {@code fit} command on the reference corpus: invented swing records made by
 * an independent hybrid integration of the compound pendulum with SciPy's {@code solve_ivp}
 * (DOP853, a terminal event at every reversal, the dissipated energies integrated as extra
 * states), written by {@code releng/reference/make_corpus.py}; no code is shared with
 * Penduline. Its {@code truth.json} holds, for each case, the mechanism, the true friction,
 * the release, offset, noise, quantisation and rate, the true energy shares, the dominant loss
 * by the 15-point rule, and where the body stops the static-friction band the stop allows.
 *
 * <p>Each case runs {@code fit} once through the command line's entry point with the lumped
 * mechanism options, the calculated inertia handed over 2 % high (so the fit has to find it),
 * ten resampling refits, and {@code --json}. Every check names the reference beside it. All of a
 * case's checks run, and a table of truth against fitted values is written to
 * {@code target/reference-corpus-report.txt}.
 */
class ReferenceCorpusTest {

    private static final String SOURCE = "SciPy solve_ivp reference, releng/reference/make_corpus.py";
    /** The calculated inertia the fit is given: 2 % above the truth, as an imperfect parts list gives it. */
    private static final double INERTIA_GIVEN = 1.02;
    /** Fit options beyond the defaults, by case: the long record compares no term sets, to stay affordable. */
    private static final Map<String, List<String>> FIT_OPTIONS = Map.of(
            "long", List.of("--terms", "viscous,coulomb,stiction"));
    private static final double SHARE_COUNTED = 0.10;
    private static final List<String> LOSSES = List.of("viscous", "coulomb", "drag");
    private static final List<String> ROWS = Collections.synchronizedList(new ArrayList<>());

    @TempDir
    Path tmp;

    static Stream<String> caseNames() throws Exception {
        List<String> names = new ArrayList<>();
        for (Object c : (List<?>) at(truth(), "cases")) {
            names.add((String) at(c, "name"));
        }
        return names.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("caseNames")
    void fitOfTheCaseAgreesWithTheReference(String name) throws Exception {
        Object c = caseOf(name);
        List<String> args = arguments(name, c);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        ExitCode code = new PendulineCommandLine().run(args.toArray(new String[0]), new PrintWriter(out, true),
                new PrintWriter(err, true));
        assertTrue(out.toString().strip().startsWith("{"), name + ": fit printed no JSON (exit " + code + "): "
                + err + out);
        Object fit = JsonTree.parse(out.toString());
        Checks k = new Checks(name);
        if ("misfit".equals(at(c, "expect"))) {
            misfit(k, c, fit, code);
        } else {
            describable(k, c, fit, code);
        }
        k.assertAllPassed();
    }

    private void misfit(Checks k, Object c, Object fit, ExitCode code) {
        k.check("exit code", "1", String.valueOf(code.code()), code == ExitCode.COMPUTATION_FAILED);
        k.check("status", "misfit", String.valueOf(at(fit, "status")), "misfit".equals(at(fit, "status")));
        k.check("dominant", "absent", has(fit, "dominant") ? String.valueOf(at(fit, "dominant")) : "absent",
                !has(fit, "dominant"));
        // the record is outside the model: the best fit leaves residuals well above the noise added
        double noise = expectedNoise(at(c, "sessions", 0));
        double rms = number(fit, "rms_residual_deg");
        k.check("rms residual ≥ 2 × noise", "≥ " + f(2 * noise) + "°", f(rms) + "°", rms >= 2 * noise);
    }

    private void describable(Checks k, Object c, Object fit, ExitCode code) {
        k.check("exit code", "0", String.valueOf(code.code()), code == ExitCode.OK);
        k.check("status", "converged", String.valueOf(at(fit, "status")), "converged".equals(at(fit, "status")));
        String dominant = (String) at(c, "dominant");
        k.check("dominant", dominant, String.valueOf(at(fit, "dominant")), dominant.equals(at(fit, "dominant")));
        for (String loss : LOSSES) {
            double share = number(c, "energy_share", loss);
            if (share >= SHARE_COUNTED) {
                double truth = number(c, truthKey(loss));
                double fitted = number(fit, "terms", loss, "value");
                double tolerance = loss.equals("drag") ? 0.05 : 0.03;
                k.check(loss + " term ±" + Math.round(tolerance * 100) + " % (share " + pct(share) + ")", g(truth),
                        g(fitted) + " (" + signedPct(fitted / truth - 1) + ")",
                        Math.abs(fitted - truth) <= tolerance * truth);
            }
        }
        double j0 = number(c, "mechanism", "pivot_inertia_kg_m2");
        double fittedJ0 = number(fit, "inertia", "fitted_kg_m2");
        k.check("inertia ±0.5 % (given " + g(INERTIA_GIVEN * j0) + ")", g(j0),
                g(fittedJ0) + " (" + signedPct(fittedJ0 / j0 - 1) + ")", Math.abs(fittedJ0 - j0) <= 0.005 * j0);
        for (String loss : LOSSES) {
            double share = number(c, "energy_share", loss);
            double fitted = number(fit, "energy_share", loss);
            k.check(loss + " energy share ±3 points", pct(share), pct(fitted), Math.abs(fitted - share) <= 0.03);
        }
        sessions(k, c, fit);
        if (at(c, "stop_band_N_m") != null) {
            stopBand(k, c, fit);
        }
    }

    private void sessions(Checks k, Object c, Object fit) {
        List<?> sessions = (List<?>) at(c, "sessions");
        for (int i = 0; i < sessions.size(); i++) {
            Object s = sessions.get(i);
            String which = sessions.size() > 1 ? " [" + at(s, "file") + "]" : "";
            double noise = number(s, "noise_deg");
            // nuisance parameters: within 0.05°, or a tenth of the noise when that is larger (our choice)
            double angleTolerance = Math.max(0.05, 0.1 * noise);
            double theta0 = number(fit, "sessions", i, "theta0_deg");
            k.check("θ0 ±" + plain(angleTolerance) + "°" + which, g(number(s, "theta0_deg")), g(theta0),
                    Math.abs(theta0 - number(s, "theta0_deg")) <= angleTolerance);
            double offset = number(fit, "sessions", i, "offset_deg");
            k.check("offset ±" + plain(angleTolerance) + "°" + which, g(number(s, "offset_deg")), g(offset),
                    Math.abs(offset - number(s, "offset_deg")) <= angleTolerance);
            double step = 1 / number(s, "rate_hz");
            double release = number(fit, "sessions", i, "release_time_s");
            k.check("release time ±0.2 sample" + which, g(number(s, "release_time_s")) + " s", g(release) + " s",
                    Math.abs(release - number(s, "release_time_s")) <= 0.2 * step);
            double expected = roundingModelled(fit, i) ? roundedSpread(s) : expectedNoise(s);
            double rms = number(fit, "sessions", i, "rms_residual_deg");
            k.check("rms residual ±10 % of the noise" + which, f(expected) + "°", f(rms) + "°",
                    Math.abs(rms - expected) <= 0.1 * expected);
        }
    }

    private void stopBand(Checks k, Object c, Object fit) {
        double ts = number(c, "stiction_N_m");
        double lower = number(c, "stop_band_N_m", "lower");
        double upper = number(c, "stop_band_N_m", "upper");
        String from = "stop_band";
        double fittedLower = number(fit, "stop_band", "lower_N_m");
        double fittedUpper = number(fit, "stop_band", "upper_N_m");
        if (Double.isNaN(fittedLower) || Double.isNaN(fittedUpper)) {
            from = "terms.stiction";
            fittedLower = number(fit, "terms", "stiction", "lower");
            fittedUpper = number(fit, "terms", "stiction", "upper");
        }
        String band = Double.isNaN(fittedLower) || Double.isNaN(fittedUpper) ? "none reported"
                : "[" + g(fittedLower) + ", " + g(fittedUpper) + "] (" + from + ")";
        // the band's lower edge may be the fitted Coulomb torque (Ts ≥ Tc), allowed 3 % like the terms
        k.check("static band holds Ts", g(ts), band,
                fittedLower <= 1.03 * ts && fittedUpper >= 0.97 * ts);
        // no wider than the stop allows: K|sin x_prev| − K|sin x_rest|, 2 % for the fitted rest angles
        k.check("static band no wider than the stops allow", "[" + g(lower) + ", " + g(upper) + "], width "
                + g(upper - lower), band, fittedUpper - fittedLower <= 1.02 * (upper - lower));
    }

    private List<String> arguments(String name, Object c) throws Exception {
        Object m = at(c, "mechanism");
        List<String> args = new ArrayList<>(List.of("fit", "--mass", num(m, "mass_kg"), "--centroid-distance",
                num(m, "centroid_distance_m"), "--pivot-inertia",
                Double.toString(INERTIA_GIVEN * number(m, "pivot_inertia_kg_m2")), "--gravity", num(m, "gravity_m_s2")));
        for (Object s : (List<?>) at(c, "sessions")) {
            args.add("--session");
            args.add(record((String) at(s, "file")).toString());
        }
        if (at(c, "record_options") instanceof Map<?, ?> options) {
            for (Map.Entry<?, ?> o : options.entrySet()) {
                args.add("--" + o.getKey());
                args.add(o.getValue() instanceof Double d && d == Math.rint(d) ? Long.toString(d.longValue())
                        : String.valueOf(o.getValue()));
            }
        }
        args.addAll(FIT_OPTIONS.getOrDefault(name, List.of()));
        args.addAll(List.of("--resamples", "10", "--json"));
        return args;
    }

    /** The record's path; a gzip-compressed record is unpacked into the temporary folder first. */
    private Path record(String file) throws Exception {
        Path packed = corpus().resolve(file);
        if (!file.endsWith(".gz")) {
            return packed;
        }
        Path plain = tmp.resolve(file.substring(0, file.length() - 3));
        try (InputStream in = new GZIPInputStream(Files.newInputStream(packed))) {
            Files.copy(in, plain);
        }
        return plain;
    }

    /** Standard deviation of what the reference added to the angle: noise and, for an encoder, rounding. */
    /** Whether the fit says it put the encoder's rounding into the model of session i. */
    private static boolean roundingModelled(Object fit, int i) {
        String name = String.valueOf(at(fit, "sessions", i, "name"));
        Object warnings = at(fit, "warnings");
        for (int w = 0; at(warnings, w) != null; w++) {
            String text = String.valueOf(at(warnings, w));
            if (text.startsWith(name + ":") && text.contains("rounding is part of the fitted measurement model")) {
                return true;
            }
        }
        return false;
    }

    /**
     * The rms of readings about their expected value when the rounding is modelled: the square
     * root of Var(round(μ + ε)) averaged over μ uniform across one count, from the count
     * probabilities of the normal distribution (Hipparchus' erfc), 400 positions, counts within
     * ±10 σ. For noise small against a count it tends to sqrt(q σ / √π) (∫Φ(1 − Φ) = 1/√π).
     */
    private static double roundedSpread(Object session) {
        double sigma = number(session, "noise_deg");
        double q = 360 / number(session, "counts_per_rev");
        int positions = 400;
        int reach = (int) Math.ceil(10 * sigma / q) + 1;
        double sum = 0;
        for (int p = 0; p < positions; p++) {
            double mu = q * ((p + 0.5) / positions - 0.5);
            double mean = 0;
            double square = 0;
            for (int k = -reach; k <= reach; k++) {
                double prob = phi((k * q + 0.5 * q - mu) / sigma) - phi((k * q - 0.5 * q - mu) / sigma);
                mean += prob * k * q;
                square += prob * k * q * k * q;
            }
            sum += square - mean * mean;
        }
        return Math.sqrt(sum / positions);
    }

    private static double phi(double x) {
        return 0.5 * Erf.erfc(-x / Math.sqrt(2));
    }

    private static double expectedNoise(Object session) {
        double noise = number(session, "noise_deg");
        double countsPerRev = number(session, "counts_per_rev");
        if (Double.isNaN(countsPerRev)) {
            return noise;
        }
        // rounding to whole counts adds a uniform error one count wide: variance count² / 12 (Widrow and
        // Kollár, Quantization Noise, 2008, the uniform quantisation-noise model)
        double count = 360 / countsPerRev;
        return Math.sqrt(noise * noise + count * count / 12);
    }

    private static String truthKey(String loss) {
        return switch (loss) {
            case "viscous" -> "viscous_N_m_s_rad";
            case "coulomb" -> "coulomb_N_m";
            default -> "drag_N_m_s2_rad2";
        };
    }

    private static Object caseOf(String name) throws Exception {
        for (Object c : (List<?>) at(truth(), "cases")) {
            if (name.equals(at(c, "name"))) {
                return c;
            }
        }
        throw new IllegalArgumentException("no case " + name + " in truth.json");
    }

    private static Path corpus() throws URISyntaxException {
        URL truth = ReferenceCorpusTest.class.getResource("/reference-corpus/truth.json");
        assertTrue(truth != null, "reference-corpus/truth.json is not on the test class path");
        return Path.of(truth.toURI()).getParent();
    }

    private static Object truth() throws Exception {
        Object t = JsonTree.parse(Files.readString(corpus().resolve("truth.json"), StandardCharsets.UTF_8));
        assertEquals(SOURCE, at(t, "source"), "truth.json is not the one this test is written for");
        return t;
    }

    @AfterAll
    static void writeReport() throws Exception {
        List<String> lines = new ArrayList<>();
        lines.add("Penduline fit against the " + SOURCE);
        lines.add(String.format(Locale.ROOT, "%-16s %-52s %-34s %-46s %s", "case", "check", "truth", "Penduline",
                "result"));
        synchronized (ROWS) {
            lines.addAll(ROWS);
        }
        Files.write(corpus().getParent().getParent().resolve("reference-corpus-report.txt"), lines,
                StandardCharsets.UTF_8);
    }

    private static String num(Object tree, String key) {
        return Double.toString(number(tree, key));
    }

    private static String g(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    private static String plain(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    private static String f(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }

    private static String pct(double share) {
        return String.format(Locale.ROOT, "%.1f %%", 100 * share);
    }

    private static String signedPct(double fraction) {
        return String.format(Locale.ROOT, "%+.2f %%", 100 * fraction);
    }

    /** One case's checks: each is recorded in the report, and all are asserted together at the end. */
    private static final class Checks {
        private final String name;
        private final List<Executable> checks = new ArrayList<>();

        Checks(String name) {
            this.name = name;
        }

        void check(String what, String truth, String fitted, boolean passed) {
            ROWS.add(String.format(Locale.ROOT, "%-16s %-52s %-34s %-46s %s", name, what, truth, fitted,
                    passed ? "pass" : "FAIL"));
            String message = name + ": " + what + ": fitted " + fitted + ", truth " + truth + " (" + SOURCE + ")";
            checks.add(() -> assertTrue(passed, message));
        }

        void assertAllPassed() {
            assertAll(name, checks);
        }
    }
}
