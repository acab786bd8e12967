package dev.penduline.benchmarks;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionFit;
import dev.penduline.physics.identify.FrictionIdentifier;
import dev.penduline.physics.identify.FrictionProblem;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.identify.ParameterEstimate;
import dev.penduline.physics.identify.ReleaseSession;
import dev.penduline.physics.identify.SessionGuess;
import dev.penduline.physics.motion.FrictionTorques;

/**
 * The Java side of the side-by-side comparison with the SciPy reference
 * ({@code releng/scripts/compare-scipy.sh}): fits a {@code time_s,angle_deg} record with the
 * same model and the same starting values as {@code reference/scipy_fit.py} (viscous +
 * Coulomb, free inertia, release angle, release time and offset; no resampling) several times
 * in one warm JVM, and prints the estimates and the median time per fit as JSON.
 *
 * <p>Usage: {@code FitTiming RECORD MASS LC J0 B TC THETA0 T_REL OFFSET REPEAT}
 */
public final class FitTiming {

    private FitTiming() {
    }

    /**
     * Runs the comparison fit.
     *
     * @param args record, mass (kg), Lc (m), J0 (kg·m²), starting b, Tc, θ0 (rad), release (s),
     *             offset (rad), repetitions
     * @throws IOException when the record cannot be read
     */
    public static void main(String[] args) throws IOException {
        double[][] record = read(Path.of(args[0]));
        double mass = Double.parseDouble(args[1]);
        double lc = Double.parseDouble(args[2]);
        double j0 = Double.parseDouble(args[3]);
        FrictionTorques start = new FrictionTorques(Double.parseDouble(args[4]), Double.parseDouble(args[5]), 0, 0);
        SessionGuess guess = new SessionGuess(Double.parseDouble(args[6]), Double.parseDouble(args[7]),
                Double.parseDouble(args[8]));
        int repeat = Integer.parseInt(args[9]);
        FrictionProblem problem = FrictionProblem.of(MechanismProperties.of(mass, lc, j0),
                List.of(new ReleaseSession("record", record[0], record[1], guess)))
                .withTerms(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB)).withStart(start);
        FrictionIdentifier identifier = new FrictionIdentifier(FitSettings.defaults().withResampling(0, 1, false));
        double[] seconds = new double[repeat];
        FrictionFit fit = null;
        for (int i = 0; i < repeat; i++) {
            long t0 = System.nanoTime();
            fit = identifier.fit(problem);
            seconds[i] = (System.nanoTime() - t0) * 1e-9;
        }
        // the first runs warm the JVM up; the median of the second half is the warm figure
        double[] warm = Arrays.copyOfRange(seconds, repeat / 2, repeat);
        Arrays.sort(warm);
        StringBuilder json = new StringBuilder("{\n  \"status\": \"").append(fit.status()).append("\",\n");
        json.append("  \"parameters\": {");
        appendParameters(json, fit, false);
        json.append("},\n  \"sigma\": {");
        appendParameters(json, fit, true);
        json.append(String.format(Locale.ROOT, "},%n  \"rms_residual_deg\": %.6f,%n  \"evaluations\": %d,%n"
                + "  \"seconds_first_fit\": %.4f,%n  \"seconds_per_fit\": %.4f%n}%n", Math.toDegrees(fit.rms()),
                fit.evaluations(), seconds[0], warm[warm.length / 2]));
        System.out.print(json);
    }

    private static void appendParameters(StringBuilder json, FrictionFit fit, boolean sigma) {
        String[][] names = {{"viscous", "b"}, {"coulomb", "Tc"}, {"pivot_inertia", "J0"}};
        for (int i = 0; i < names.length; i++) {
            ParameterEstimate p = fit.parameter(names[i][1]).orElseThrow();
            json.append(i == 0 ? "" : ", ").append('"').append(names[i][0]).append("\": ")
                    .append(sigma ? p.sigmaJacobian() : p.value());
        }
        ParameterEstimate t = fit.sessions().get(0).releaseTime();
        ParameterEstimate a = fit.sessions().get(0).releaseAngle();
        ParameterEstimate o = fit.sessions().get(0).offset();
        json.append(", \"release_time_s\": ").append(sigma ? t.sigmaJacobian() : t.value())
                .append(", \"theta0_rad\": ").append(sigma ? a.sigmaJacobian() : a.value())
                .append(", \"offset_rad\": ").append(sigma ? o.sigmaJacobian() : o.value());
    }

    private static double[][] read(Path file) throws IOException {
        double[] t = new double[1 << 16];
        double[] y = new double[1 << 16];
        int n = 0;
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            boolean header = true;
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                int comma = line.indexOf(',');
                if (n == t.length) {
                    t = Arrays.copyOf(t, 2 * n);
                    y = Arrays.copyOf(y, 2 * n);
                }
                t[n] = Double.parseDouble(line.substring(0, comma));
                y[n] = Math.toRadians(Double.parseDouble(line.substring(comma + 1)));
                n++;
            }
        }
        return new double[][] {Arrays.copyOf(t, n), Arrays.copyOf(y, n)};
    }
}
