package dev.penduline.services;

import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.function.Consumer;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;
import dev.penduline.physics.motion.SwingSimulator;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.InputLimits;

/**
 * Invented swing records made with our own simulator, with what real records have: a still
 * segment before the release, a sensor offset, noise and encoder quantisation. For demos and
 * for checking the analysis against a known truth. Every file says in its first lines that it
 * is invented and with which settings.
 */
public final class DemoRecords {

    /** How to make a demo record. */
    public record Settings(double theta0, double offset, double noise, double countsPerRevolution, double stillTime,
            double duration, double sampleRate, long seed) {

        /**
         * Checks the settings.
         *
         * @throws IllegalArgumentException naming the setting
         */
        public Settings {
            if (!(duration > 0) || !(sampleRate > 0) || !(stillTime >= 0) || !(noise >= 0)) {
                throw new InvalidValueException("duration and rate must be positive, still time and noise not "
                        + "negative");
            }
            double samples = Math.floor(duration * sampleRate) + 1;
            if (samples > InputLimits.MAX_RECORD_SAMPLES) {
                throw new InvalidValueException(String.format(Locale.ROOT, "--duration %.6g s at --rate %.6g Hz makes %.4g "
                        + "samples, more than the %d a record may have (README, \"Limits\"); shorten the duration or lower "
                        + "the rate", duration, sampleRate, samples, InputLimits.MAX_RECORD_SAMPLES));
            }
            if (!(countsPerRevolution >= 0)) {
                throw new InvalidValueException("counts per revolution must be positive (or 0 for an angle in "
                        + "degrees)");
            }
        }
    }

    private DemoRecords() {
    }

    /**
     * Writes a demo record.
     *
     * @param mechanism the mechanism
     * @param friction  the true friction torques
     * @param s         the settings
     * @param target    the CSV to write (atomically): {@code time_s,counts} with an encoder,
     *                  else {@code time_s,angle_deg}; an existing file is not replaced
     * @return the simulated run (without offset, noise and quantisation)
     * @throws InputException when the file exists or cannot be written or a value is out of range
     */
    public static SwingRun write(MechanismSource mechanism, FrictionTorques friction, Settings s, Path target)
            throws InputException {
        return write(mechanism, friction, s, target, false, note -> { });
    }

    /**
     * Writes a demo record, as {@link #write(MechanismSource, FrictionTorques, Settings, Path)},
     * with the choice of replacing an existing plain file (see {@link OutputFiles}: a record or a
     * mechanism file is never replaced).
     *
     * @param mechanism the mechanism
     * @param friction  the true friction torques
     * @param s         the settings
     * @param target    the CSV to write (atomically)
     * @param overwrite whether an existing plain file may be replaced
     * @param notes     receives notes of the save for the user
     * @return the simulated run (without offset, noise and quantisation)
     * @throws InputException when the file may not or cannot be written or a value is out of range
     */
    public static SwingRun write(MechanismSource mechanism, FrictionTorques friction, Settings s, Path target,
            boolean overwrite, Consumer<String> notes) throws InputException {
        OutputFiles.check(target, overwrite);
        MechanismProperties p = mechanism.properties();
        SwingPrediction.requireSwing(p, friction, s.theta0(), 0);
        MechanismProperties aboutEquilibrium = new MechanismProperties(p.mass(), p.centroidDistance(),
                p.pivotInertia(), 0, p.gravity(), p.axisTilt());
        int n = (int) Math.floor(s.duration() * s.sampleRate()) + 1;
        // The release falls between two samples, as it does in a real test.
        double release = s.stillTime() + 0.37 / s.sampleRate();
        int firstMoving = (int) Math.ceil(release * s.sampleRate());
        double[] motionTimes = new double[Math.max(1, n - firstMoving)];
        for (int i = 0; i < motionTimes.length; i++) {
            motionTimes[i] = (firstMoving + i) / s.sampleRate() - release;
        }
        SwingRun run;
        try {
            run = new SwingSimulator(aboutEquilibrium, friction).simulate(s.theta0(), 0, motionTimes);
        } catch (InvalidValueException e) {
            throw new InputException(e.getMessage(), e);
        }
        double[] motion = run.angles();
        SplittableRandom random = new SplittableRandom(s.seed());
        boolean encoder = s.countsPerRevolution() > 0;
        double radPerCount = encoder ? 2 * Math.PI / s.countsPerRevolution() : 0;
        OutputFiles.write(target, overwrite, out -> {
            out.write("# INVENTED DEMO DATA synthesised by Penduline's simulator; not a measurement.\n");
            out.write(String.format(Locale.ROOT,
                    "# truth: release %.6f s at %.4f deg from equilibrium; offset %.4f deg; viscous %s, coulomb %s,"
                            + " stiction %s, drag %s (SI); noise %.4f deg; %s; seed %d%n",
                    release, Unit.DEGREE.fromSi(s.theta0()), Unit.DEGREE.fromSi(s.offset()), friction.viscous(),
                    friction.coulomb(), friction.staticTorque(), friction.drag(), Unit.DEGREE.fromSi(s.noise()),
                    encoder ? "encoder " + (long) s.countsPerRevolution() + " counts/rev" : "angle in degrees",
                    s.seed()));
            out.write(encoder ? "time_s,counts\n" : "time_s,angle_deg\n");
            StringBuilder line = new StringBuilder(48);
            for (int i = 0; i < n; i++) {
                double t = i / s.sampleRate();
                double theta = i < firstMoving ? s.theta0() : motion[i - firstMoving];
                double reading = theta + s.offset() + s.noise() * random.nextGaussian();
                line.setLength(0);
                line.append(String.format(Locale.ROOT, "%.6f", t)).append(',');
                if (encoder) {
                    line.append(Math.round(reading / radPerCount));
                } else {
                    line.append(String.format(Locale.ROOT, "%.5f", Unit.DEGREE.fromSi(reading)));
                }
                line.append('\n');
                out.write(line.toString());
            }
        }).forEach(notes);
        return run;
    }
}
