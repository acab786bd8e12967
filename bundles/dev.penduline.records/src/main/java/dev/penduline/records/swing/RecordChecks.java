package dev.penduline.records.swing;

import java.util.Arrays;
import java.util.List;

import dev.penduline.physics.InputMessage;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.RecordFormatException;

/** Whole-record checks after the streaming pass: size, motion, gaps, plausibility of the step. */
final class RecordChecks {

    private static final int MAX_GAP_WARNINGS = 20;
    /** The shortest median sampling step taken for a swing record (s): 1 MHz. */
    static final double MIN_STEP_S = 1e-6;

    private RecordChecks() {
    }

    static void check(SampleSeries s, SwingImportOptions o, SwingRecordMapping mapping, String file,
            List<String> assumptions, List<String> warnings) throws RecordFormatException {
        final int n = s.size();
        if (n < o.minimumSamples()) {
            throw new RecordFormatException(file, 0, null, InputMessage.TOO_FEW_SAMPLES.format(n, n == 1 ? "" : "s",
                    o.minimumSamples()));
        }
        final double[] angles = s.angles();
        double min = angles[0];
        double max = angles[0];
        for (double a : angles) {
            min = Math.min(min, a);
            max = Math.max(max, a);
        }
        if (max - min < o.minimumMotion()) {
            throw new RecordFormatException(file, 0, mapping.angleColumn().name(), InputMessage.ANGLE_NEVER_MOVES.format(
                    SwingRecordReader.format(mapping.angleUnit().fromSi(max - min)), mapping.angleUnit().symbol(), n));
        }
        final double[] steps = new double[n - 1];
        for (int i = 1; i < n; i++) {
            steps[i - 1] = s.time(i) - s.time(i - 1);
        }
        final double[] sorted = steps.clone();
        Arrays.sort(sorted);
        final double median = sorted[sorted.length / 2];
        int gaps = 0;
        for (int i = 0; i < steps.length; i++) {
            if (steps[i] > o.gapFactor() * median) {
                if (gaps < MAX_GAP_WARNINGS) {
                    warnings.add(file + ":" + s.line(i + 1) + ": gap of " + SwingRecordReader.format(steps[i])
                            + " s before this line, " + SwingRecordReader.format(steps[i] / median)
                            + " times the median step of " + SwingRecordReader.format(median)
                            + " s: samples may have been dropped");
                }
                gaps++;
            }
        }
        if (gaps > MAX_GAP_WARNINGS) {
            warnings.add(file + ": " + (gaps - MAX_GAP_WARNINGS) + " more gaps not listed");
        }
        if (!(median >= MIN_STEP_S)) {
            throw new RecordFormatException(file, 0, mapping.timeColumn().name(), InputMessage.TIME_STEP_TOO_SHORT.format(
                    SwingRecordReader.format(median)));
        }
        if (median > 0.5 && mapping.timeUnit().equals(Unit.SECOND)) {
            warnings.add(file + ": the median step is " + SwingRecordReader.format(median)
                    + " s, slow for a swing record: is the time column in ms?");
        }
        assumptions.add(n + " samples, median step " + SwingRecordReader.format(median) + " s ("
                + SwingRecordReader.format(1 / median) + " Hz)"
                + (sorted[sorted.length - 1] > 1.5 * sorted[0] ? ", irregular" : ""));
    }
}
