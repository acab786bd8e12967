package dev.penduline.physics.swing;

/**
 * Where a free-release record leaves its still segment.
 *
 * @param time         release instant in the record's time base (s)
 * @param uncertainty  one-standard-deviation uncertainty of {@code time} (s)
 * @param index        first sample at or after the release
 * @param stillLevel   the angle read while the body was held (rad, sensor frame)
 * @param noise        noise standard deviation of the still segment, from its MAD, at least
 *                     the quantisation noise {@code q/√12} (rad)
 * @param quantum      the quantisation step found in the record (rad), 0 when not quantised
 * @param stillSamples number of samples before the release that belong to the still segment
 * @param fromRest     false when the record starts already moving (no still segment found);
 *                     the release is then the first sample and its level unknown
 * @param method       how the instant was obtained, for the report
 */
public record Release(double time, double uncertainty, int index, double stillLevel, double noise,
        double quantum, int stillSamples, boolean fromRest, String method) {
}
