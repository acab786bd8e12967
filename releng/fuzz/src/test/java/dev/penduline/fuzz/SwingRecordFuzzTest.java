package dev.penduline.fuzz;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Timeout;

import com.code_intelligence.jazzer.api.FuzzedDataProvider;
import com.code_intelligence.jazzer.junit.FuzzTest;

import dev.penduline.physics.units.Unit;
import dev.penduline.records.RecordFormatException;
import dev.penduline.records.swing.ColumnChoice;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.records.swing.SwingRecordReader;

/**
 * Fuzzes {@link SwingRecordReader} (with its layout sniffing) on arbitrary bytes and import
 * options.
 *
 * <p>The options come from the input's last bytes (Jazzer's data provider takes numbers from
 * the end): when the very last byte is below 0x80 — as for any text file, a seed included —
 * only that byte is used and the defaults apply (detect everything); otherwise further bytes
 * choose the delimiter, decimal separator, header, columns, units and counts per revolution, as
 * the command line's record options can. The rest of the input is the file.
 *
 * <p>Each input must either give a record or raise a {@link RecordFormatException} whose
 * message names the file and passes {@link InputChecks}; anything else, an error or a hang is a
 * finding. A record that is read must keep what the reader promises: as many times as angles,
 * at least the minimum number of samples, finite times strictly increasing, finite angles that
 * move at least the minimum motion, and the SHA-256 and byte count of exactly the bytes given.
 */
@Timeout(value = 10, unit = TimeUnit.SECONDS)
class SwingRecordFuzzTest {

    private static final String FILE = "record.csv";
    private static final Character[] DELIMITERS = {null, ',', ';', '\t'};
    private static final Character[] DECIMALS = {null, '.', ','};
    private static final Boolean[] HEADERS = {null, true, false};
    private static final String[] NAMES = {"time_s", "t_ms", "angle_deg", "theta_rad", "counts", "time (us)", "x", " T "};
    private static final Unit[] TIME_UNITS = {null, Unit.SECOND, Unit.MILLISECOND, Unit.MICROSECOND};
    private static final Unit[] ANGLE_UNITS = {null, Unit.DEGREE, Unit.RADIAN, Unit.ENCODER_COUNT};
    private static final double[] COUNTS = {Double.NaN, 4096, 1, 3.5, 1e-300, 1e300};

    @FuzzTest
    void swingRecord(FuzzedDataProvider data) throws IOException {
        final SwingImportOptions options = options(data);
        final byte[] input = data.consumeRemainingAsBytes();
        if (options == null) {
            return;
        }
        final SwingRecord record;
        try {
            record = new SwingRecordReader().read(new ByteArrayInputStream(input), FILE, options);
        } catch (RecordFormatException e) {
            InputChecks.errorMessage(e.getMessage(), FILE, input);
            return;
        }
        check(record, options, input);
    }

    /** The options the last bytes choose; null for a combination the options refuse (not an input). */
    private static SwingImportOptions options(FuzzedDataProvider data) {
        final int mode = data.consumeByte() & 0xff;
        SwingImportOptions o = SwingImportOptions.defaults();
        if (mode < 0x80) {
            return o;
        }
        try {
            o = new SwingImportOptions(pick(data, DELIMITERS), pick(data, DECIMALS), pick(data, HEADERS),
                    column(data), column(data), pick(data, TIME_UNITS), pick(data, ANGLE_UNITS),
                    COUNTS[data.consumeInt(0, COUNTS.length - 1)], data.consumeBoolean() ? 5 : data.consumeDouble(),
                    data.consumeBoolean() ? 20 : data.consumeInt(10, 40), Math.toRadians(0.1));
        } catch (IllegalArgumentException e) {
            return null;
        }
        return o;
    }

    private static <T> T pick(FuzzedDataProvider data, T[] choices) {
        return choices[data.consumeInt(0, choices.length - 1)];
    }

    private static ColumnChoice column(FuzzedDataProvider data) {
        final int k = data.consumeInt(0, 2);
        return switch (k) {
            case 0 -> null;
            case 1 -> ColumnChoice.byIndex(data.consumeInt(1, 5));
            default -> ColumnChoice.byName(NAMES[data.consumeInt(0, NAMES.length - 1)]);
        };
    }

    private static void check(SwingRecord r, SwingImportOptions o, byte[] input) {
        final double[] t = r.times();
        final double[] a = r.angles();
        if (t.length != a.length || r.size() != t.length) {
            throw new AssertionError(t.length + " times but " + a.length + " angles (size " + r.size() + ")");
        }
        if (t.length < o.minimumSamples()) {
            throw new AssertionError("a record of " + t.length + " samples passed (minimum " + o.minimumSamples() + ")");
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < t.length; i++) {
            if (!Double.isFinite(t[i]) || !Double.isFinite(a[i])) {
                throw new AssertionError("sample " + i + " is not finite: " + t[i] + ", " + a[i]);
            }
            if (i > 0 && !(t[i] > t[i - 1])) {
                throw new AssertionError("time does not increase at sample " + i + ": " + t[i - 1] + ", " + t[i]);
            }
            min = Math.min(min, a[i]);
            max = Math.max(max, a[i]);
        }
        if (max - min < o.minimumMotion()) {
            throw new AssertionError("a record that never moves passed: range " + (max - min) + " rad");
        }
        if (!r.sha256().equals(sha256(input)) || r.byteCount() != input.length) {
            throw new AssertionError("the hash or byte count is not that of the bytes read");
        }
        for (List<String> texts : List.of(r.warnings(), r.assumptions())) {
            for (String s : texts) {
                InputChecks.userText("warning or assumption", s, input);
            }
        }
    }

    private static String sha256(byte[] input) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(input));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
