package dev.penduline.physics.identify;

import java.util.Collections;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;

/**
 * What to identify: the mechanism as calculated, one or more recorded releases, the friction
 * terms to fit, whether the inertia is free, and starting values for the friction.
 *
 * <p>The mechanism's equilibrium angle is not used: each session's offset plays its part.
 * Starting values of zero for a fitted term are replaced by an equal share of the damping the
 * other starting values imply (or of a 1 % damping ratio when all are zero).
 *
 * @param mechanism   the calculated mass properties (m, Lc, J0, g, tilt)
 * @param sessions    the releases, at least one, with distinct names
 * @param terms       the friction terms to fit, at least one
 * @param inertiaFree whether J0 is fitted (recommended) or held at the calculated value
 * @param start       starting values of b, Tc, Ts, c (SI units)
 */
public record FrictionProblem(MechanismProperties mechanism, List<ReleaseSession> sessions,
        Set<FrictionTerm> terms, boolean inertiaFree, FrictionTorques start) {

    /**
     * Checks the problem and freezes the collections.
     *
     * @throws IllegalArgumentException naming what is wrong
     */
    public FrictionProblem {
        Objects.requireNonNull(mechanism, "mechanism");
        Objects.requireNonNull(sessions, "sessions");
        Objects.requireNonNull(terms, "terms");
        Objects.requireNonNull(start, "start");
        if (sessions.isEmpty()) {
            throw new InvalidValueException("at least one session is needed");
        }
        final Set<String> names = new HashSet<>();
        for (ReleaseSession s : sessions) {
            if (!names.add(Objects.requireNonNull(s, "session").name())) {
                throw new InvalidValueException("two sessions are named '" + s.name() + "'");
            }
        }
        if (terms.isEmpty()) {
            throw new InvalidValueException("at least one friction term must be fitted");
        }
        if (!(mechanism.gravityStiffness() > 0)) {
            throw new InvalidValueException("the mechanism has no gravity stiffness (m g cos α Lc = "
                    + mechanism.gravityStiffness() + " N·m/rad): a balanced body does not swing");
        }
        sessions = List.copyOf(sessions);
        terms = Collections.unmodifiableSet(EnumSet.copyOf(terms));
    }

    /**
     * A problem fitting viscous and Coulomb friction and the inertia, from zero starting values.
     *
     * @param mechanism the calculated mass properties
     * @param sessions  the releases
     * @return the problem
     */
    public static FrictionProblem of(MechanismProperties mechanism, List<ReleaseSession> sessions) {
        return new FrictionProblem(mechanism, sessions, EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB),
                true, FrictionTorques.none());
    }

    /**
     * Returns a copy fitting other terms.
     *
     * @param newTerms the terms to fit
     * @return the copy
     */
    public FrictionProblem withTerms(Set<FrictionTerm> newTerms) {
        return new FrictionProblem(mechanism, sessions, newTerms, inertiaFree, start);
    }

    /**
     * Returns a copy with the inertia free or fixed.
     *
     * @param free true to fit J0
     * @return the copy
     */
    public FrictionProblem withInertiaFree(boolean free) {
        return new FrictionProblem(mechanism, sessions, terms, free, start);
    }

    /**
     * Returns a copy with other starting values.
     *
     * @param newStart starting values of b (N·m·s/rad), Tc (N·m), Ts (N·m), c (N·m·s²/rad²)
     * @return the copy
     */
    public FrictionProblem withStart(FrictionTorques newStart) {
        return new FrictionProblem(mechanism, sessions, terms, inertiaFree, newStart);
    }

    /**
     * Returns a copy with other sessions.
     *
     * @param newSessions the releases
     * @return the copy
     */
    public FrictionProblem withSessions(List<ReleaseSession> newSessions) {
        return new FrictionProblem(mechanism, newSessions, terms, inertiaFree, start);
    }

    /**
     * Total number of samples over all sessions.
     *
     * @return the sample count
     */
    public int samples() {
        return sessions.stream().mapToInt(ReleaseSession::size).sum();
    }
}
