package dev.penduline.physics.forecast;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.hipparchus.analysis.solvers.BrentSolver;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;
import dev.penduline.physics.motion.TurningPoint;

/**
 * Forecasts the swing after a release by simulating it: first for {@link #FIRST_PERIODS}
 * small-angle periods, then four times longer each time the swing is still outside the band at
 * the end, up to {@link #MAX_PERIODS} periods.
 *
 * <p>Samples are taken {@link #SAMPLES_PER_PERIOD} times per small-angle period; crossings of a
 * band edge or of a chosen angle are located between samples on the cubic Hermite interpolant
 * of the angle (whose slopes are the sampled angular velocities), and the angular velocity at a
 * crossing on the cubic through the four samples around it. The peak
 * angular velocity is refined by a parabola through the three samples around it. Turning points
 * come from the simulator's reversal events, so an excursion outside the band between samples is
 * never missed.
 */
public final class Forecaster {

    /** Samples per small-angle period. */
    public static final int SAMPLES_PER_PERIOD = 256;
    /** Small-angle periods simulated first. */
    public static final int FIRST_PERIODS = 40;
    /** The longest run, in small-angle periods. */
    public static final int MAX_PERIODS = 2560;

    private static final double CROSSING_ACCURACY = 1e-12;

    private final SwingSimulator simulator;

    /**
     * A forecaster on a configured simulator (mechanism, friction, tolerance, gravity model).
     *
     * @param simulator the simulator
     * @throws IllegalArgumentException when the body has no restoring torque (no period)
     */
    public Forecaster(SwingSimulator simulator) {
        this.simulator = simulator;
        if (!(simulator.mechanism().gravityStiffness() > 0)) {
            throw new InvalidValueException("the centroid lies on the pivot axis (or gravity acts along it): "
                    + "there is no restoring torque and no swing to forecast");
        }
    }

    /**
     * Forecasts the swing.
     *
     * @param request the release and the questions
     * @return the forecast
     */
    public SwingForecast forecast(ForecastRequest request) {
        final MechanismProperties m = simulator.mechanism();
        final double period = m.smallAnglePeriod();
        final double rate = SAMPLES_PER_PERIOD / period;
        final double theta0 = m.equilibriumAngle() + request.releaseAngle();
        double duration = FIRST_PERIODS * period;
        SwingRun run;
        boolean inside;
        while (true) {
            run = simulator.simulate(theta0, request.releaseVelocity(), duration, rate);
            inside = !run.stopped() && endsInside(run, request.band(), period);
            if (run.stopped() || inside || duration >= MAX_PERIODS * period) {
                break;
            }
            duration = Math.min(4 * duration, MAX_PERIODS * period);
        }
        return summarise(run, request, duration, inside);
    }

    /**
     * The forecast figures of a run this forecaster's simulator made (same mechanism and
     * friction) from the request's release, over the run's own length.
     *
     * @param run     the run
     * @param request the release it was made from and the questions
     * @return the figures; "not settled" when the run ends outside the band
     */
    public SwingForecast summarise(SwingRun run, ForecastRequest request) {
        final double[] t = run.times();
        return summarise(run, request, t[t.length - 1],
                !run.stopped() && endsInside(run, request.band(), simulator.mechanism().smallAnglePeriod()));
    }

    private SwingForecast summarise(SwingRun run, ForecastRequest request, double duration, boolean insideAtEnd) {
        final MechanismProperties m = simulator.mechanism();
        final double eq = m.equilibriumAngle();
        final double[] t = run.times();
        final double[] x = run.angles();
        for (int i = 0; i < x.length; i++) {
            x[i] -= eq;
        }
        final double[] w = run.velocities();
        final List<TurningPoint> tps = run.turningPoints();
        final RestBand restBand = RestBand.of(m, simulator.friction().staticTorque(), simulator.linearGravity());
        final double band = request.band();

        String note = "";
        boolean settled;
        double settleTime;
        final double restAngle = run.stopped() ? wrap(run.restAngle() - eq) : Double.NaN;
        final double[] wrapped = new double[x.length];
        double farthest = 0;
        for (int i = 0; i < x.length; i++) {
            wrapped[i] = wrap(x[i]);
            farthest = Math.max(farthest, Math.abs(x[i]));
        }
        if (run.stopped() && Math.abs(restAngle) > band) {
            settled = false;
            settleTime = Double.NaN;
            note = String.format(Locale.ROOT, "it comes to rest at %.4g° from the equilibrium, outside the ±%.4g° band:"
                    + " static friction holds it there", Math.toDegrees(restAngle), Math.toDegrees(band));
        } else if (!run.stopped() && !insideAtEnd) {
            settled = false;
            settleTime = Double.NaN;
            note = String.format(Locale.ROOT, "it is still outside the ±%.4g° band at the end of the %.4g s"
                    + " simulated", Math.toDegrees(band), duration);
        } else {
            settled = true;
            settleTime = settleTime(t, wrapped, w, tps, eq, band);
        }
        if (farthest > Math.PI) {
            final String over = String.format(Locale.ROOT, "it goes over the top (%d full turn(s)) before it swings;"
                    + " angles of the band and the rest are taken modulo a turn", (int) Math.floor((farthest + Math.PI)
                    / (2 * Math.PI)));
            note = note.isEmpty() ? over : note + "; " + over;
        }
        final double end = settled ? settleTime : duration;
        int halfSwings = end > 0 ? 1 : 0;
        for (TurningPoint p : tps) {
            if (p.time() > 0 && p.time() < end) {
                halfSwings++;
            }
        }
        final double[] peak = peak(t, x, w);
        return new SwingForecast(settled, settleTime, halfSwings, restBand, restAngle,
                peak[0], peak[1], peak[2], overshoot(tps, eq, request),
                pass(t, x, w, request, m.pivotInertia()), run.energy(), duration, note);
    }

    /** Whether the last period of samples and the last turning point lie inside the band. */
    private boolean endsInside(SwingRun run, double band, double period) {
        final double eq = simulator.mechanism().equilibriumAngle();
        final double[] t = run.times();
        final double[] x = run.angles();
        final double last = t[t.length - 1];
        for (int i = x.length - 1; i >= 0 && t[i] >= last - period; i--) {
            if (Math.abs(wrap(x[i] - eq)) > band) {
                return false;
            }
        }
        final List<TurningPoint> tps = run.turningPoints();
        return tps.isEmpty() || Math.abs(wrap(tps.get(tps.size() - 1).angle() - eq)) <= band;
    }

    /**
     * When the swing enters the band for good: just after the later of the last sample and the
     * last turning point outside it.
     */
    private static double settleTime(double[] t, double[] x, double[] w, List<TurningPoint> tps, double eq,
            double band) {
        int lastOut = -1;
        for (int i = x.length - 1; i >= 0; i--) {
            if (Math.abs(x[i]) > band) {
                lastOut = i;
                break;
            }
        }
        double t0 = lastOut >= 0 ? t[lastOut] : Double.NEGATIVE_INFINITY;
        double x0 = lastOut >= 0 ? x[lastOut] : 0;
        double w0 = lastOut >= 0 ? w[lastOut] : 0;
        for (int k = tps.size() - 1; k >= 0; k--) {
            final TurningPoint p = tps.get(k);
            if (Math.abs(wrap(p.angle() - eq)) > band) {
                if (p.time() > t0) {
                    t0 = p.time();
                    x0 = wrap(p.angle() - eq);
                    w0 = 0;
                }
                break;
            }
        }
        if (t0 == Double.NEGATIVE_INFINITY) {
            return 0;
        }
        int next = lastOut + 1;
        while (next < t.length && t[next] <= t0) {
            next++;
        }
        if (next >= t.length) {
            return t[t.length - 1];
        }
        final double edge = Math.copySign(band, x0);
        return crossing(t0, x0 - edge, w0, t[next], x[next] - edge, w[next]);
    }

    /** The root in [ta, tb] of the cubic Hermite interpolant through (ta, ya, va) and (tb, yb, vb). */
    private static double crossing(double ta, double ya, double va, double tb, double yb, double vb) {
        if (ya == 0) {
            return ta;
        }
        if (yb == 0 || Math.signum(ya) == Math.signum(yb)) {
            return tb;
        }
        final double h = tb - ta;
        final BrentSolver solver = new BrentSolver(CROSSING_ACCURACY * Math.max(1, tb));
        return solver.solve(100, s -> hermite((s - ta) / h, ya, h * va, yb, h * vb), ta, tb);
    }

    private static double hermite(double s, double y0, double m0, double y1, double m1) {
        final double s2 = s * s;
        final double s3 = s2 * s;
        return (2 * s3 - 3 * s2 + 1) * y0 + (s3 - 2 * s2 + s) * m0 + (-2 * s3 + 3 * s2) * y1 + (s3 - s2) * m1;
    }

    /** {largest |ω|, its time, the angle then}, refined by a parabola through three samples. */
    private static double[] peak(double[] t, double[] x, double[] w) {
        int best = 0;
        for (int i = 1; i < w.length; i++) {
            if (Math.abs(w[i]) > Math.abs(w[best])) {
                best = i;
            }
        }
        if (best == 0 || best == w.length - 1) {
            return new double[] {Math.abs(w[best]), t[best], x[best]};
        }
        final double a = Math.abs(w[best - 1]);
        final double b = Math.abs(w[best]);
        final double c = Math.abs(w[best + 1]);
        final double curvature = a - 2 * b + c;
        if (!(curvature < 0)) {
            return new double[] {b, t[best], x[best]};
        }
        final double s = 0.5 * (a - c) / curvature;
        final double h = t[best + 1] - t[best];
        final double time = t[best] + s * h;
        final double value = b - 0.25 * (a - c) * s;
        final int from = s < 0 ? best - 1 : best;
        final double hs = t[from + 1] - t[from];
        final double angle = hermite((time - t[from]) / hs, x[from], hs * w[from], x[from + 1], hs * w[from + 1]);
        return new double[] {value, time, angle};
    }

    /** The largest turning-point excursion on the side away from the release. */
    private static double overshoot(List<TurningPoint> tps, double eq, ForecastRequest request) {
        double side = -Math.signum(request.releaseAngle());
        double largest = 0;
        for (TurningPoint p : tps) {
            if (p.time() <= 0) {
                continue;
            }
            final double d = p.angle() - eq;
            if (side == 0) {
                side = Math.signum(d);
                continue;
            }
            if (Math.signum(d) == side) {
                largest = Math.max(largest, Math.abs(d));
            }
        }
        return largest;
    }

    private static Optional<AnglePass> pass(double[] t, double[] x, double[] w, ForecastRequest request,
            double inertia) {
        final double a = request.passAngle();
        if (Double.isNaN(a)) {
            return Optional.empty();
        }
        for (int i = 0; i + 1 < t.length; i++) {
            final double ya = x[i] - a;
            final double yb = x[i + 1] - a;
            if (ya != 0 && yb != 0 && Math.signum(ya) == Math.signum(yb) || ya == 0 && i == 0 || t[i + 1] == t[i]) {
                continue;
            }
            final double time = crossing(t[i], ya, w[i], t[i + 1], yb, w[i + 1]);
            final double omega = lagrange(t, w, i, time);
            final double tip = Double.isNaN(request.radius()) ? Double.NaN : Math.abs(omega) * request.radius();
            return Optional.of(new AnglePass(a, time, omega, tip, 0.5 * inertia * omega * omega));
        }
        return Optional.empty();
    }

    /** An angle brought into (−π, π]: the same position of the body. */
    private static double wrap(double a) {
        if (a > -Math.PI && a <= Math.PI) {
            return a;
        }
        final double r = Math.IEEEremainder(a, 2 * Math.PI);
        return r <= -Math.PI ? r + 2 * Math.PI : r;
    }

    /** The cubic through the (up to) four samples around [t[i], t[i+1]], evaluated at {@code time}. */
    private static double lagrange(double[] t, double[] y, int i, double time) {
        final int from = Math.max(0, Math.min(i - 1, t.length - 4));
        final int to = Math.min(t.length, from + 4);
        double sum = 0;
        for (int a = from; a < to; a++) {
            double term = y[a];
            for (int b = from; b < to; b++) {
                if (b != a) {
                    term *= (time - t[b]) / (t[a] - t[b]);
                }
            }
            sum += term;
        }
        return sum;
    }
}
