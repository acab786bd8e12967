package dev.penduline.physics.swing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.EllipticSwing;

/**
 * Turns a free-release record (times and angles in SI) into a prepared swing and its decay
 * analysis: release, zero offset, turning points, periods against the large-amplitude
 * prediction, envelopes, the decrement regression, a verdict on the dominant loss and first
 * friction estimates. Immutable; {@code withX} return copies.
 */
public final class SwingAnalyzer {

    private final MechanismProperties mechanism;
    private final ReleaseDetector detector;
    private final double dominance;

    /** An analyzer without a mechanism (no period prediction, no friction estimates). */
    public SwingAnalyzer() {
        this(null, new ReleaseDetector(), 0.6);
    }

    private SwingAnalyzer(MechanismProperties mechanism, ReleaseDetector detector, double dominance) {
        this.mechanism = mechanism;
        this.detector = detector;
        this.dominance = dominance;
    }

    /**
     * Returns a copy that knows the mechanism.
     *
     * @param properties mass properties of the body, or null when unknown
     * @return the copy
     */
    public SwingAnalyzer withMechanism(MechanismProperties properties) {
        return new SwingAnalyzer(properties, detector, dominance);
    }

    /**
     * Returns a copy with another release detector.
     *
     * @param releaseDetector the detector
     * @return the copy
     */
    public SwingAnalyzer withReleaseDetector(ReleaseDetector releaseDetector) {
        return new SwingAnalyzer(mechanism, releaseDetector, dominance);
    }

    /**
     * Returns a copy with another share a loss needs to be called dominant.
     *
     * @param share fraction of the mean decrement (dimensionless), in (0.34, 1]
     * @return the copy
     */
    public SwingAnalyzer withDominance(double share) {
        if (!(share > 0.34 && share <= 1)) {
            throw new IllegalArgumentException("share must be in (0.34, 1], got " + share);
        }
        return new SwingAnalyzer(mechanism, detector, share);
    }

    /**
     * Finds the release, trims, finds the turning points and the equilibrium and smooths the
     * velocity.
     *
     * @param t     sample times (s), finite and strictly increasing; not modified
     * @param theta angles in the sensor's frame (rad), finite; not modified
     * @return the prepared swing
     * @throws IllegalArgumentException naming the first bad sample, or when the record does not
     *                                  swing
     */
    public PreparedSwing prepare(double[] t, double[] theta) {
        check(t, theta);
        final Release release = detector.detect(t, theta);
        final double[] tt = Arrays.copyOfRange(t, release.index(), t.length);
        final double[] th = Arrays.copyOfRange(theta, release.index(), theta.length);
        if (tt.length < 10) {
            throw new InvalidValueException("only " + tt.length + " samples after the release at "
                    + release.time() + " s: too short to analyse");
        }
        final SwingOutline outline = TurningPointFinder.find(tt, th, release);
        final ZeroOffset offset = ZeroOffsetEstimator.estimate(outline.points(), outline.settledLevel(),
                release.noise());
        final List<MeasuredTurningPoint> points = new ArrayList<>();
        for (MeasuredTurningPoint p : outline.points()) {
            points.add(p.withAmplitudeFrom(offset.value()));
        }
        requireDecay(points, release.noise());
        final double step = RobustStatistics.medianStep(tt);
        final double period = Double.isFinite(outline.period()) ? outline.period() : tt[tt.length - 1] - tt[0];
        SavitzkyGolay filter = SavitzkyGolay.forSwing(step, period);
        final int maxHalf = (tt.length - 1) / 2;
        if (filter.halfWidth() > maxHalf) {
            filter = new SavitzkyGolay(maxHalf, Math.min(3, 2 * maxHalf));
        }
        return new PreparedSwing(tt, th, filter.derivative(tt, th), release, offset, points, filter, outline);
    }

    /**
     * Prepares and analyses a record.
     *
     * @param t     sample times (s), finite and strictly increasing
     * @param theta angles in the sensor's frame (rad)
     * @return the analysis
     */
    public SwingAnalysis analyse(double[] t, double[] theta) {
        return analyse(prepare(t, theta));
    }

    /**
     * Analyses the decay of a prepared swing.
     *
     * @param swing the prepared swing
     * @return the analysis
     */
    public SwingAnalysis analyse(PreparedSwing swing) {
        final List<String> warnings = new ArrayList<>();
        final Release release = swing.release();
        if (!release.fromRest()) {
            warnings.add("no still segment before the motion: the release time and θ0 are those of the first sample");
        }
        if (swing.offset().method() != ZeroOffset.Method.SWING_SYMMETRY) {
            warnings.add("zero offset " + swing.offset().note());
        }
        final List<MeasuredTurningPoint> all = swing.turningPoints();
        final List<MeasuredTurningPoint> usable = new ArrayList<>();
        for (MeasuredTurningPoint p : all) {
            if (p.amplitude() < 2 * swing.noiseBand()) {
                break;
            }
            usable.add(p);
        }
        if (usable.size() < all.size()) {
            warnings.add((all.size() - usable.size()) + " late turning point(s) within twice the noise band ("
                    + fmt(2 * swing.noiseBand()) + " rad) were left out of the decrement analysis");
        }
        final List<HalfSwing> halves = new ArrayList<>();
        for (int i = 0; i + 1 < usable.size(); i++) {
            halves.add(HalfSwing.between(i, usable.get(i), usable.get(i + 1)));
        }
        final List<SwingCycle> cycles = cycles(usable);
        final PeriodCheck periodCheck = periodCheck(cycles, warnings);
        final double[] amplitudes = usable.stream().mapToDouble(MeasuredTurningPoint::amplitude).toArray();
        final List<DecayEnvelope> envelopes = EnvelopeFitter.fit(amplitudes);
        final double[] mean = halves.stream().mapToDouble(HalfSwing::meanAmplitude).toArray();
        final double[] decrement = halves.stream().mapToDouble(HalfSwing::equivalentDecrement).toArray();
        final DecrementRegression regression = DecrementFitter.fit(mean, decrement);
        if (halves.size() < 4) {
            warnings.add("only " + halves.size() + " half-swings: the decrement regression is weak");
        }
        final LossVerdict verdict = VerdictRules.judge(regression, mean, envelopes, dominance);
        Optional<FrictionEstimates> estimates = Optional.empty();
        if (mechanism != null && regression != null && mechanism.gravityStiffness() > 0) {
            estimates = Optional.of(FrictionEstimates.from(regression, mechanism.gravityStiffness(),
                    mechanism.naturalFrequency()));
        }
        final double theta0 = (release.fromRest() ? release.stillLevel() : all.get(0).angle()) - swing.offset().value();
        return new SwingAnalysis(release, swing.offset(), theta0, all, halves, cycles, periodCheck, envelopes,
                Optional.ofNullable(regression), verdict, estimates, stop(swing), warnings);
    }

    private List<SwingCycle> cycles(List<MeasuredTurningPoint> points) {
        final List<SwingCycle> cycles = new ArrayList<>();
        for (int i = 0; i + 2 < points.size(); i++) {
            final MeasuredTurningPoint a = points.get(i);
            final MeasuredTurningPoint b = points.get(i + 1);
            final MeasuredTurningPoint c = points.get(i + 2);
            if (c.kind() == MeasuredTurningPoint.Kind.STOP) {
                break;
            }
            final double amplitude = 0.25 * (a.amplitude() + 2 * b.amplitude() + c.amplitude());
            final double period = c.time() - a.time();
            double predicted = Double.NaN;
            if (mechanism != null && mechanism.gravityStiffness() > 0 && amplitude < Math.PI) {
                predicted = new EllipticSwing(mechanism, mechanism.equilibriumAngle() + amplitude).period();
            }
            cycles.add(new SwingCycle(i, a.time(), period, amplitude, a.amplitude() - c.amplitude(), predicted,
                    period / predicted - 1));
        }
        return cycles;
    }

    private PeriodCheck periodCheck(List<SwingCycle> cycles, List<String> warnings) {
        if (cycles.isEmpty()) {
            return new PeriodCheck(Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        final double[] small = new double[cycles.size()];
        final double[] relative = new double[cycles.size()];
        for (int i = 0; i < small.length; i++) {
            final SwingCycle c = cycles.get(i);
            final double k = Math.sin(0.5 * c.amplitude());
            // T / T0 = 2 K(m) / π with m = k² (Abramowitz & Stegun 17.3; Hipparchus takes m)
            small[i] = c.period() / (2 * LegendreEllipticIntegral.bigK(k * k) / Math.PI);
            relative[i] = c.relativeDifference();
        }
        final double measured = RobustStatistics.medianInPlace(small);
        if (mechanism == null || !(mechanism.gravityStiffness() > 0)) {
            return new PeriodCheck(measured, Double.NaN, Double.NaN, Double.NaN);
        }
        final double median = RobustStatistics.medianInPlace(relative);
        final double implied = mechanism.pivotInertia() * (1 + median) * (1 + median);
        if (Math.abs(median) > 0.02) {
            warnings.add(String.format(Locale.ROOT, "the measured period is %+.1f %% from the mechanism's prediction:"
                    + " check the inertia J0 (the period implies %.4g kg·m² against %.4g) or the centroid distance",
                    100 * median, implied, mechanism.pivotInertia()));
        }
        return new PeriodCheck(measured, mechanism.smallAnglePeriod(), median, implied);
    }

    private StopInfo stop(PreparedSwing swing) {
        final StopFinder.Stop s = swing.stop();
        if (s == null) {
            return StopInfo.moving();
        }
        final ZeroOffset offset = swing.offset();
        final double x = s.level() - offset.value();
        final double sigma = Math.hypot(offset.uncertainty(), s.levelUncertainty());
        final double previous = s.previousAngle() - offset.value();
        final double k = mechanism == null ? Double.NaN : mechanism.gravityStiffness();
        double lower = Double.NaN;
        double upper = Double.NaN;
        double resolution = Double.NaN;
        String note = "at rest from the last reversal at " + fmt(s.time()) + " s, " + fmt(x) + " rad (± " + fmt(sigma)
                + " rad) from the equilibrium";
        if (offset.method() == ZeroOffset.Method.SETTLED_TAIL) {
            note += "; the equilibrium was read from this rest, so the stop cannot bound stiction";
        } else if (!(k > 0)) {
            note += "; give the mechanism for the band of static friction the stop allows";
        } else {
            upper = k * Math.abs(Math.sin(previous));
            final String above = "; it moved on from the reversal before, " + fmt(previous)
                    + " rad out, so stiction is below K|sin x_prev| = " + fmt(upper) + " N·m";
            if (!Double.isFinite(sigma)) {
                note += "; the equilibrium's uncertainty is not known, so no lower end is given" + above;
            } else {
                resolution = k * Math.sin(Math.min(0.5 * Math.PI, 2 * sigma));
                if (Math.abs(x) > 2 * sigma) {
                    lower = k * Math.abs(Math.sin(x));
                    note += ": held there, so stiction is at least K|sin x| = " + fmt(lower) + " N·m" + above;
                } else {
                    note += ", within twice its uncertainty: the stop shows no evidence of stiction above what that"
                            + " uncertainty allows (K|sin 2σ| = " + fmt(resolution) + " N·m)" + above;
                }
            }
        }
        return new StopInfo(true, s.time(), s.timeUncertainty(), s.level(), x, sigma, previous, lower, upper,
                resolution, note);
    }

    /** A free swing only loses energy: turning points that grow mean a driven body, or not an angle at all. */
    private static void requireDecay(List<MeasuredTurningPoint> points, double noise) {
        if (points.size() < 3) {
            return;
        }
        final double first = points.get(0).amplitude();
        final double last = points.get(points.size() - 1).amplitude();
        if (Double.isFinite(first) && Double.isFinite(last) && last > 1.25 * first && last - first > 8 * noise) {
            throw new InvalidValueException("the swing grows instead of decaying (amplitude " + RobustStatistics.degrees(first)
                    + " at the first turning point, " + RobustStatistics.degrees(last) + " at the last): a free swing only loses "
                    + "energy, so this is not a free release (a driven body?) or the angle column is not the angle");
        }
    }

    private static void check(double[] t, double[] theta) {
        if (t.length != theta.length) {
            throw new IllegalArgumentException("times and angles differ in length: " + t.length + " and "
                    + theta.length);
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < t.length; i++) {
            if (!Double.isFinite(t[i]) || !Double.isFinite(theta[i])) {
                throw new InvalidValueException("sample " + i + " is not finite: t = " + t[i] + " s, θ = "
                        + theta[i] + " rad");
            }
            min = Math.min(min, theta[i]);
            max = Math.max(max, theta[i]);
            if (i > 0 && !(t[i] > t[i - 1])) {
                throw new InvalidValueException("times must increase: sample " + i + " at " + t[i]
                        + " s follows " + t[i - 1] + " s");
            }
        }
        if (max - min > 2 * Math.PI) {
            throw new InvalidValueException("the angles span " + RobustStatistics.degrees(max - min) + ", more than a full turn: "
                    + "a free swing spans less than 360° (twice its release angle at most); check the angle unit (degrees, "
                    + "radians or counts) and the counts per revolution");
        }
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
