package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;

/**
 * The staged point fit of one term set.
 *
 * <ol>
 * <li><b>Lock</b>: the first few periods after the release, decimated, with the friction held
 * at its starting values: θ0, t_r, offset per session and J0. Phase and frequency are what a
 * far-off start gets wrong, and a short window has no room for a wrong phase to build up.</li>
 * <li><b>Motion</b>: the record up to where the body comes to rest, decimated to about 100
 * samples per period, every free parameter. Leaving out the final rest matters: which reversal
 * the model stops at is a discrete decision, and a model that stops one reversal early or late
 * leaves a constant misfit over the whole rest that gradients cannot see; fitted on the
 * motion alone, the parameters arrive close enough to stop where the record does. Decimation
 * makes this stage cheap, so the full stage needs only a few iterations.</li>
 * <li><b>Full</b>: every sample, every free parameter, warm-started from the motion stage.</li>
 * <li><b>Stiction</b> (when fitted): Ts bracketed from the stops ({@link StictionBracket}),
 * fixed at the middle of its band, and the full stage repeated, until the band settles.</li>
 * </ol>
 */
final class StagedFit {

    /** Reference damping ratio for the friction scales (ζ = 1 %). */
    private static final double REFERENCE_DAMPING = 0.01;
    private static final int STICTION_ROUNDS = 3;
    /** Decimation of the motion stage: enough samples per period to resolve every term. */
    private static final int MOTION_SAMPLES_PER_PERIOD = 100;

    private StagedFit() {
    }

    static PointFit run(FrictionProblem problem, Set<FrictionTerm> terms, FitSettings settings,
            FitControl control) {
        final MechanismProperties mechanism = problem.mechanism();
        final MechanismProperties level = level(mechanism);
        final double k = mechanism.gravityStiffness();
        final double j = mechanism.pivotInertia();
        final double wn = Math.sqrt(k / j);
        final List<ReleaseSession> sessions = problem.sessions();
        final int count = sessions.size();
        double amplitude = 0;
        for (ReleaseSession s : sessions) {
            amplitude = Math.max(amplitude, Math.abs(s.guess().releaseAngle()));
        }
        final FrictionTorques start = StartingValues.forTerms(problem.start(), terms, k, j, amplitude);
        final int size = ParameterLayout.PHYSICAL + ParameterLayout.PER_SESSION * count;
        final double[] full = new double[size];
        final double[] scales = new double[size];
        final double[] shifts = new double[size];
        final double[] lower = new double[size];
        Arrays.fill(lower, Double.NEGATIVE_INFINITY);
        final double reference = 2 * REFERENCE_DAMPING * Math.sqrt(k * j);
        full[0] = start.viscous();
        full[1] = start.coulomb();
        full[2] = start.drag();
        full[3] = j;
        scales[0] = reference;
        scales[1] = reference * Math.PI * wn * amplitude / 4;
        scales[2] = reference * 3 * Math.PI / (8 * wn * amplitude);
        scales[3] = j;
        lower[0] = 0;
        lower[1] = 0;
        lower[2] = 0;
        lower[3] = mechanism.mass() * mechanism.centroidDistance() * mechanism.centroidDistance();
        final List<String> names = new ArrayList<>();
        for (int s = 0; s < count; s++) {
            final SessionGuess g = sessions.get(s).guess();
            names.add(sessions.get(s).name());
            full[ParameterLayout.index(s, 0)] = g.releaseAngle();
            full[ParameterLayout.index(s, 1)] = g.releaseTime();
            full[ParameterLayout.index(s, 2)] = g.offset();
            scales[ParameterLayout.index(s, 0)] = Math.abs(g.releaseAngle());
            scales[ParameterLayout.index(s, 1)] = 1 / wn;
            scales[ParameterLayout.index(s, 2)] = Math.abs(g.releaseAngle());
            shifts[ParameterLayout.index(s, 1)] = g.releaseTime();
            shifts[ParameterLayout.index(s, 2)] = g.offset();
        }
        final boolean[] lockFree = new boolean[size];
        final boolean[] fullFree = new boolean[size];
        for (int s = 0; s < count; s++) {
            for (int q = 0; q < ParameterLayout.PER_SESSION; q++) {
                lockFree[ParameterLayout.index(s, q)] = true;
                fullFree[ParameterLayout.index(s, q)] = true;
            }
        }
        lockFree[3] = problem.inertiaFree();
        fullFree[3] = problem.inertiaFree();
        fullFree[0] = terms.contains(FrictionTerm.VISCOUS);
        fullFree[1] = terms.contains(FrictionTerm.COULOMB);
        fullFree[2] = terms.contains(FrictionTerm.DRAG);
        final ParameterLayout fullLayout = new ParameterLayout(names, scales, shifts, lower, fullFree);
        double stiction = start.stiction();
        int iterations = 0;
        int evaluations = 0;
        double[] current = full;
        final double period = 2 * Math.PI / wn;
        if (settings.lockCycles() > 0) {
            final List<StageSamples> window = new ArrayList<>();
            for (ReleaseSession s : sessions) {
                final double[] t = s.timesView();
                final double spacing = (t[t.length - 1] - t[0]) / (t.length - 1);
                final int stride = (int) Math.max(1, Math.floor(period / spacing / settings.lockSamplesPerPeriod()));
                window.add(StageSamples.window(s, s.guess().releaseTime() + settings.lockCycles() * period, stride));
            }
            final StageOutcome lock = LevenbergStage.run("lock", fullLayout.withFree(lockFree), current, window, k,
                    stiction, settings, control);
            iterations += lock.iterations();
            evaluations += lock.evaluations();
            if (lock.status() == FitStatus.CANCELLED) {
                return new PointFit(fullLayout, lock, window, stiction, null, iterations, evaluations);
            }
            current = lock.full();
        }
        final List<StageSamples> all = new ArrayList<>();
        final List<StageSamples> motion = new ArrayList<>();
        boolean thinned = false;
        for (ReleaseSession s : sessions) {
            all.add(StageSamples.all(s));
            final double[] t = s.timesView();
            final double spacing = (t[t.length - 1] - t[0]) / (t.length - 1);
            final int stride = (int) Math.max(1, Math.floor(period / spacing / MOTION_SAMPLES_PER_PERIOD));
            final double end = RecordSignals.motionEnd(s) + 0.5 * period;
            motion.add(StageSamples.window(s, end, stride));
            thinned |= stride > 1 || end < t[t.length - 1];
        }
        if (thinned) {
            final StageOutcome moving = LevenbergStage.run("motion", fullLayout, current, motion, k, stiction,
                    settings, control);
            iterations += moving.iterations();
            evaluations += moving.evaluations();
            if (moving.status() == FitStatus.CANCELLED) {
                return new PointFit(fullLayout, moving, motion, stiction, null, iterations, evaluations);
            }
            current = moving.full();
        }
        StageOutcome outcome = LevenbergStage.run("full", fullLayout, current, all, k, stiction, settings, control);
        iterations += outcome.iterations();
        evaluations += outcome.evaluations();
        StictionBand band = null;
        if (terms.contains(FrictionTerm.STICTION)) {
            for (int round = 0; round < STICTION_ROUNDS && outcome.status() != FitStatus.CANCELLED; round++) {
                band = StictionBracket.of(level, outcome.full(), all, settings.integrationTolerance());
                final double next = band.middle();
                if (round > 0 && Math.abs(next - stiction) <= 1e-3 * next) {
                    break;
                }
                stiction = next;
                outcome = LevenbergStage.run("stiction", fullLayout, outcome.full(), all, k, stiction, settings,
                        control);
                iterations += outcome.iterations();
                evaluations += outcome.evaluations();
            }
        }
        return new PointFit(fullLayout, outcome, all, stiction, band, iterations, evaluations);
    }

    /** The mechanism with its equilibrium at the sensor's zero: each session's offset carries it. */
    static MechanismProperties level(MechanismProperties m) {
        return new MechanismProperties(m.mass(), m.centroidDistance(), m.pivotInertia(), 0, m.gravity(),
                m.axisTilt());
    }
}
