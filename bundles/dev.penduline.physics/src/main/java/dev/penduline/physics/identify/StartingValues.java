package dev.penduline.physics.identify;

import java.util.Set;

import dev.penduline.physics.motion.FrictionTorques;

/**
 * Starting friction for a term set, from whatever starting values the caller gave.
 *
 * <p>Terms are compared through their equivalent viscous coefficient, the b that dissipates
 * the same energy per cycle of amplitude A at frequency ωn: Coulomb {@code 4 Tc/(π ωn A)},
 * drag {@code 8 c ωn A/(3π)} (Thomson, Theory of Vibration with Applications, "equivalent
 * viscous damping"). A fitted term whose starting value is zero gets an equal share of the
 * damping the others leave unexplained (at least a fifth of the total), so every candidate
 * starts with a plausible decay; with no starting values at all, a 1 % damping ratio.
 */
final class StartingValues {

    private static final double DEFAULT_DAMPING_RATIO = 0.01;

    private StartingValues() {
    }

    static FrictionTorques forTerms(FrictionTorques given, Set<FrictionTerm> terms, double stiffness,
            double inertia, double amplitude) {
        final double wn = Math.sqrt(stiffness / inertia);
        final double a = Math.max(amplitude, 1e-4);
        final double perCoulomb = 4 / (Math.PI * wn * a);
        final double perDrag = 8 * wn * a / (3 * Math.PI);
        double total = given.viscous() + given.coulomb() * perCoulomb + given.drag() * perDrag;
        if (!(total > 0)) {
            total = 2 * DEFAULT_DAMPING_RATIO * Math.sqrt(stiffness * inertia);
        }
        final boolean v = terms.contains(FrictionTerm.VISCOUS);
        final boolean c = terms.contains(FrictionTerm.COULOMB);
        final boolean d = terms.contains(FrictionTerm.DRAG);
        double b = v ? given.viscous() : 0;
        double tc = c ? given.coulomb() : 0;
        double drag = d ? given.drag() : 0;
        final double explained = b + tc * perCoulomb + drag * perDrag;
        int missing = 0;
        missing += v && b == 0 ? 1 : 0;
        missing += c && tc == 0 ? 1 : 0;
        missing += d && drag == 0 ? 1 : 0;
        if (missing > 0) {
            final double share = Math.max(total - explained, 0.2 * total) / missing;
            b = v && b == 0 ? share : b;
            tc = c && tc == 0 ? share / perCoulomb : tc;
            drag = d && drag == 0 ? share / perDrag : drag;
        }
        final double ts = terms.contains(FrictionTerm.STICTION) && given.stiction() > tc ? given.stiction() : 0;
        return new FrictionTorques(b, tc, ts, drag);
    }
}
