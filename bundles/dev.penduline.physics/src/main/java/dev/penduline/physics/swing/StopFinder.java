package dev.penduline.physics.swing;

/**
 * Finds where a free decay comes to rest for good: the last reversal, after which the body does
 * not move again.
 *
 * <p>What a stick looks like in a record: a body sticks only at a reversal (ω = 0) and, once held,
 * stays; after it the reading is a constant level plus noise, or a creep far slower than a swing.
 * Small last half-swings of a few noise σ are real motion and must not be taken for rest; a slow
 * creep of the reading after the stick is not a swing and must not delay the stop; and the level
 * an encoder reads at rest may sit anywhere between two counts, so the distance from a rounded
 * level says little.
 *
 * <p>The steps:
 * <ol>
 * <li>Smooth the angle with a cubic Savitzky–Golay filter over a quarter of a period: wide enough
 * to average the noise, narrow enough (±45° of phase) to follow a half-swing to a tenth of a
 * percent. Its noise is {@code g·σ}, g = √Σw² the filter's noise gain and σ the noise of one
 * sample, read from the last third of the record as the MAD of the residual of the narrower
 * filter used for the velocity (at least the quantisation noise q/√12).</li>
 * <li>Moving or still: the body counts as moving at t when the smoothed angle spans more than
 * {@code h = k·g·σ + q/2} over the following half period, k = {@value #HOLD_SIGMAS}. A half-swing
 * of peak-to-peak D spans D over the half period that starts at its reversal, so any half-swing
 * larger than h is seen (h is about 1.5 σ of a single reading at 250 samples per period). Still
 * samples span only the range of a few independent smoothed values: for white noise, k = 6 is
 * exceeded in one window in a hundred, which a long rest meets once or more, while k = 8 is
 * exceeded in about one in 10⁵ (counted over two million samples of simulated noise with SciPy's
 * savgol_filter; the choice is ours). A creep of rate r spans r·P/2 and passes unseen while that
 * is below h. The span needs no level, so neither a creep nor a level between two counts biases
 * the test.</li>
 * <li>The last moving window starts at t_m; the body has stopped when the record stays still for
 * at least a period after that window. The last sample farther than h from the level after the
 * window lies in the last half-swing; the extreme on its side within 0.6 of a period before it is
 * close to the reversal before the stop, x_prev.</li>
 * <li>The last cycle is fitted ({@link LastCycle}): the half-swing into x_prev, the half-swing out
 * of it and the rest, joined at the reversal tp; the stop is half a period after tp. A body
 * sticks only at a reversal, and a half-swing of small amplitude lasts half a period whatever
 * the friction: dry friction shifts its centre, not its length (Den Hartog, Mechanical
 * Vibrations, "Coulomb damping"), and light viscous damping lengthens it by 1/√(1 − ζ²). Using
 * both half-swings keeps the timing free of the asymmetry of the peak at x_prev (the gravity
 * torque there is helped by friction on one side and opposed on the other) and of the rounded
 * level of an encoder.</li>
 * <li>The rest reading is the mean of the readings over the period after the stop, within a band
 * of their median (noise dithers a quantised level), with the uncertainty that quantisation
 * leaves.</li>
 * </ol>
 */
final class StopFinder {

    /** The detection threshold k in standard deviations of the smoothed angle. */
    static final double HOLD_SIGMAS = 8;

    /** How far, in noise standard deviations, a single reading must lie from the rest to count as away. */
    private static final double RAW_SIGMAS = 6;

    /**
     * Where the body came to rest.
     *
     * @param index             first sample at or after the stop instant
     * @param time              the stop instant, in the record's time base (s)
     * @param timeUncertainty   its standard uncertainty from the fit of the last cycle (s), NaN when
     *                          that fit could not be made
     * @param level             the rest reading (rad, sensor frame)
     * @param levelUncertainty  standard uncertainty of the level: noise over the samples averaged
     *                          and, for an encoder, what quantisation leaves (rad)
     * @param previousTime      time of the reversal before the stop (s)
     * @param previousAngle     its reading (rad, sensor frame)
     * @param previousUncertainty standard uncertainty of that reading (rad)
     */
    record Stop(int index, double time, double timeUncertainty, double level, double levelUncertainty,
            double previousTime, double previousAngle, double previousUncertainty) {
    }

    private StopFinder() {
    }

    /**
     * The stop of a trimmed record, or null when it is still moving at its end.
     *
     * @param t       times from the release on (s)
     * @param theta   angles (rad)
     * @param quantum the quantisation step (rad), 0 when none
     * @param period  the swing period (s), finite and &gt; 0
     */
    static Stop find(double[] t, double[] theta, double quantum, double period) {
        final int n = t.length;
        final double step = RobustStatistics.medianStep(t);
        final SavitzkyGolay narrow = SavitzkyGolay.forSwing(step, period);
        final int wideHalf = (int) Math.max(2, Math.min(200, Math.round(period / (8 * step))));
        final SavitzkyGolay filter = new SavitzkyGolay(wideHalf, 3);
        if (2 * wideHalf + 1 > n || 2 * narrow.halfWidth() + 1 > n) {
            return null;
        }
        final double[] w = SavitzkyGolay.weights(narrow.halfWidth(), narrow.order(), 0);
        final double sigma = noise(theta, narrow.smooth(t, theta), narrow.halfWidth(), quantum, w[narrow.halfWidth()]);
        final double[] smooth = filter.smooth(t, theta);
        double gain2 = 0;
        for (double v : SavitzkyGolay.weights(wideHalf, 3, 0)) {
            gain2 += v * v;
        }
        final double smoothSigma = Math.sqrt(gain2) * sigma;
        final double h = HOLD_SIGMAS * smoothSigma + 0.5 * quantum;
        final int moving = lastMovingWindow(t, smooth, n - filter.halfWidth(), 0.5 * period, h);
        if (moving < 0 || t[n - 1] - t[moving] < 1.5 * period) {
            return null;
        }
        final int restFrom = TurningPointFinder.lowerIndex(t, t[moving] + 0.5 * period) + 1;
        final int restTo = TurningPointFinder.lowerIndex(t, t[restFrom] + 2 * period) + 1;
        final double firstLevel = level(theta, restFrom, restTo, sigma, quantum)[0];
        final int[] approach = departure(t, theta, smooth, moving, restFrom, firstLevel, RAW_SIGMAS * sigma
                + 0.5 * quantum, h);
        final int departure = approach[0];
        final double side = approach[1];
        final int searchFrom = TurningPointFinder.lowerIndex(t, t[departure] - 0.6 * period);
        int extreme = searchFrom;
        for (int i = searchFrom; i <= departure; i++) {
            if (side * smooth[i] > side * smooth[extreme]) {
                extreme = i;
            }
        }
        final double[] cycle = lastCycle(t, theta, t[extreme], period);
        final double previousTime;
        final double previousAngle;
        final double timeUncertainty;
        if (cycle != null) {
            previousTime = cycle[0];
            previousAngle = cycle[1];
            timeUncertainty = cycle[2];
        } else {
            final MeasuredTurningPoint p = previous(t, theta, smooth, extreme, side, period, quantum, firstLevel);
            previousTime = p.time();
            previousAngle = p.angle();
            timeUncertainty = Double.NaN;
        }
        final double time = previousTime + 0.5 * period;
        int index = TurningPointFinder.lowerIndex(t, time);
        if (t[index] < time && index + 1 < n) {
            index++;
        }
        final double[] rest = level(theta, index, TurningPointFinder.lowerIndex(t, time + period) + 1, sigma, quantum);
        return new Stop(index, time, timeUncertainty, rest[0], rest[1], previousTime, previousAngle, smoothSigma);
    }

    /**
     * The last sample of the final approach and the side of the level it lies on, {index, ±1}:
     * the last raw reading farther than {@code rawLimit} from the rest level within a quarter
     * period before the last moving window, or failing that (a last half-swing lost in the noise
     * of single readings) the last smoothed one farther than {@code smoothLimit}. Raw readings
     * first, because smoothing rounds the corner where the body sticks and can carry the smoothed
     * angle a little past the level just after it; a sample there would tell the wrong side.
     */
    private static int[] departure(double[] t, double[] theta, double[] smooth, int moving, int restFrom,
            double level, double rawLimit, double smoothLimit) {
        final int earliest = TurningPointFinder.lowerIndex(t, t[moving] - 0.5 * (t[restFrom] - t[moving]));
        for (int i = restFrom - 1; i >= earliest; i--) {
            if (Math.abs(theta[i] - level) > rawLimit) {
                return new int[] {i, theta[i] > level ? 1 : -1};
            }
        }
        int i = restFrom - 1;
        while (i > 0 && Math.abs(smooth[i] - level) <= smoothLimit) {
            i--;
        }
        i = Math.min(i, moving);
        return new int[] {i, smooth[i] > level ? 1 : -1};
    }

    /**
     * The noise of one sample from the last third of the record: the MAD of the residual of the
     * smoothing, scaled by 1/√(1 − w0) (the residual of a least-squares smoother keeps that share
     * of white noise), at least the quantisation noise q/√12.
     */
    private static double noise(double[] theta, double[] smooth, int edge, double quantum, double centreWeight) {
        final int n = theta.length - edge;
        final int from = Math.min(2 * theta.length / 3, n - 1);
        final double[] r = new double[n - from];
        for (int i = from; i < n; i++) {
            r[i - from] = theta[i] - smooth[i];
        }
        final double mad = RobustStatistics.mad(r, 0, r.length, RobustStatistics.median(r, 0, r.length));
        final double sigma = RobustStatistics.MAD_TO_SIGMA * mad / Math.sqrt(Math.max(0.5, 1 - centreWeight));
        double range = 0;
        for (double v : theta) {
            range = Math.max(range, Math.abs(v - theta[0]));
        }
        return Math.max(sigma, Math.max(quantum / Math.sqrt(12), 1e-12 * range));
    }

    /**
     * Start of the last window [t_i, t_i + span] over which the smoothed angle spans more than
     * the threshold, −1 when there is none; samples from n on (the end of the record, where the
     * smoothing polynomial is evaluated off-centre and its noise grows) are left out. Walks back from the end with monotone queues of the
     * window's maximum and minimum, so it reads only the still tail and the last window.
     */
    private static int lastMovingWindow(double[] t, double[] smooth, int n, double span, double threshold) {
        final int[] max = new int[n];
        final int[] min = new int[n];
        int maxHead = 0;
        int maxTail = 0;
        int minHead = 0;
        int minTail = 0;
        for (int i = n - 1; i >= 0; i--) {
            while (maxTail > maxHead && smooth[max[maxTail - 1]] <= smooth[i]) {
                maxTail--;
            }
            max[maxTail++] = i;
            while (minTail > minHead && smooth[min[minTail - 1]] >= smooth[i]) {
                minTail--;
            }
            min[minTail++] = i;
            while (t[max[maxHead]] > t[i] + span) {
                maxHead++;
            }
            while (t[min[minHead]] > t[i] + span) {
                minHead++;
            }
            if (smooth[max[maxHead]] - smooth[min[minHead]] > threshold) {
                return i;
            }
        }
        return -1;
    }

    /**
     * The rest level of samples [from, to) and its standard uncertainty: the mean within a band of
     * the median, and √(s²/N + u_q²). For an encoder the mean of readings rounded to a step q is
     * biased by at most about (q/π)·exp(−2π²σ²/q²) for Gaussian noise σ (the first term of the
     * Fourier series of the quantiser, Widrow &amp; Kollár, Quantization Noise, Cambridge 2008,
     * ch. 4; checked numerically here), vanishing once noise dithers the counts and reaching q/2
     * without noise; u_q = (q/√12)·exp(−2π²σ²/q²) is used, σ² from the readings' variance less
     * Sheppard's q²/12.
     */
    private static double[] level(double[] theta, int from, int to, double sigma, double quantum) {
        final int end = Math.max(from + 1, Math.min(theta.length, to));
        final double median = RobustStatistics.median(theta, from, end);
        final double band = Math.max(4 * sigma, 2.5 * quantum);
        double sum = 0;
        int count = 0;
        for (int i = from; i < end; i++) {
            if (Math.abs(theta[i] - median) <= band) {
                sum += theta[i];
                count++;
            }
        }
        if (count == 0) {
            return new double[] {median, sigma};
        }
        final double mean = sum / count;
        double squares = 0;
        for (int i = from; i < end; i++) {
            if (Math.abs(theta[i] - median) <= band) {
                squares += (theta[i] - mean) * (theta[i] - mean);
            }
        }
        final double variance = count > 1 ? squares / (count - 1) : sigma * sigma;
        double quantisation = 0;
        if (quantum > 0) {
            final double dither = Math.max(0, variance - quantum * quantum / 12);
            quantisation = quantum / Math.sqrt(12) * Math.exp(-2 * Math.PI * Math.PI * dither / (quantum * quantum));
        }
        return new double[] {mean, Math.sqrt(variance / count + quantisation * quantisation)};
    }

    private static MeasuredTurningPoint previous(double[] t, double[] theta, double[] smooth, int extreme,
            double side, double period, double quantum, double level) {
        final int from = TurningPointFinder.lowerIndex(t, t[extreme] - 0.25 * period);
        final int to = TurningPointFinder.lowerIndex(t, t[extreme] + 0.25 * period) + 1;
        final MeasuredTurningPoint p = TurningPointFinder.refine(t, theta, extreme, side, period / 12, from, to,
                quantum, period, 0.5 * (smooth[extreme] + level));
        if (Math.abs(p.time() - t[extreme]) > 0.1 * period || side * (p.angle() - smooth[extreme]) > 0.5 * side
                * (smooth[extreme] - level)) {
            return new MeasuredTurningPoint(t[extreme], smooth[extreme], Double.NaN, MeasuredTurningPoint.Kind.REVERSAL);
        }
        return p;
    }

    /**
     * {time of the reversal before the stop, its reading, the time's uncertainty} from the fit of
     * the last cycle, or null when the samples cannot support it.
     */
    private static double[] lastCycle(double[] t, double[] theta, double guess, double period) {
        final double reach = period / 8;
        final int from = TurningPointFinder.lowerIndex(t, guess + reach - 0.45 * period);
        final int to = TurningPointFinder.lowerIndex(t, guess + period) + 1;
        if (to - from < 12) {
            return null;
        }
        final LastCycle model = new LastCycle(t, theta, from, to, 2 * Math.PI / period);
        final double[] fit = ProfileScan.minimise(model::rss, guess - reach, guess + reach, to - from - 4);
        final double[] c = model.coefficients(fit[0]);
        if (c != null) {
            return new double[] {fit[0], c[0], fit[1]};
        }
        return null;
    }

    /**
     * The last cycle as a small-amplitude swing with dry friction: about the reversal at tp with
     * reading X, the half-swing before is a cosine about its centre c1, the one after a cosine
     * about c2 ending half a period later at 2 c2 − X, where the body stays. Exact for linear
     * gravity with Coulomb friction (each half-swing is harmonic about a centre shifted by ±Tc/K,
     * Den Hartog, Mechanical Vibrations, "Coulomb damping"); the small viscous decay within a
     * half-swing is left out. For a trial tp the model is linear in (X, c1, c2).
     */
    private static final class LastCycle {

        private final double[] t;
        private final double[] theta;
        private final int from;
        private final int to;
        private final double omega;

        LastCycle(double[] t, double[] theta, int from, int to, double omega) {
            this.t = t;
            this.theta = theta;
            this.from = from;
            this.to = to;
            this.omega = omega;
        }

        private void basis(double time, double tp, double[] x) {
            final double phase = omega * (time - tp);
            if (phase < 0) {
                x[0] = Math.cos(phase);
                x[1] = 1 - x[0];
                x[2] = 0;
            } else if (phase < Math.PI) {
                x[0] = Math.cos(phase);
                x[1] = 0;
                x[2] = 1 - x[0];
            } else {
                x[0] = -1;
                x[1] = 0;
                x[2] = 2;
            }
        }

        double[] coefficients(double tp) {
            final double[][] normal = new double[3][3];
            final double[] rhs = new double[3];
            final double[] x = new double[3];
            for (int j = from; j < to; j++) {
                basis(t[j], tp, x);
                for (int p = 0; p < 3; p++) {
                    rhs[p] += x[p] * theta[j];
                    for (int q = 0; q < 3; q++) {
                        normal[p][q] += x[p] * x[q];
                    }
                }
            }
            return LocalPolynomial.solve(normal, rhs, 3);
        }

        double rss(double tp) {
            final double[] c = coefficients(tp);
            if (c == null) {
                return Double.POSITIVE_INFINITY;
            }
            final double[] x = new double[3];
            double sum = 0;
            for (int j = from; j < to; j++) {
                basis(t[j], tp, x);
                final double r = theta[j] - (c[0] * x[0] + c[1] * x[1] + c[2] * x[2]);
                sum += r * r;
            }
            return sum;
        }
    }
}
