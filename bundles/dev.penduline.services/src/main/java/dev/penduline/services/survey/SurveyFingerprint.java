package dev.penduline.services.survey;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.records.swing.SwingImportOptions;

/**
 * What a survey row was fitted with, as one SHA-256: the mechanism file's content, the terms
 * asked for, whether the inertia was held, every fit setting (resamples, seed, limits,
 * tolerances, verdict rules), how the records were read, and Penduline's version. A row of the
 * journal is reused only under the same fingerprint (and with the same records' hashes).
 */
public final class SurveyFingerprint {

    private SurveyFingerprint() {
    }

    /**
     * The fingerprint.
     *
     * @param mechanismSha256 the mechanism file's SHA-256
     * @param terms           the terms asked for, or empty for the comparison
     * @param fixInertia      whether the inertia is held
     * @param fit             the fit's settings (made single-threaded first, so --jobs is not part of it)
     * @param options         how the records are read
     * @param version         Penduline's version
     * @return the fingerprint, lowercase hexadecimal
     */
    public static String of(String mechanismSha256, Optional<Set<FrictionTerm>> terms, boolean fixInertia, FitSettings fit,
            SwingImportOptions options, String version) {
        FitSettings single = fit.withResampling(fit.resamples(), fit.seed(), false);
        String text = "mechanism=" + mechanismSha256 + "\nterms=" + terms.map(t -> new TreeSet<>(t).toString()).orElse("auto")
                + "\nfix-inertia=" + fixInertia + "\nfit=" + single + "\nrecords=" + options + "\nversion=" + version + "\n";
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("the JDK always provides SHA-256", e);
        }
    }
}
