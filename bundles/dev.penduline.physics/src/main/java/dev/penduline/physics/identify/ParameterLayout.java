package dev.penduline.physics.identify;

import java.util.Arrays;
import java.util.List;

import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.ParameterValidator;

/**
 * The map between the full parameter vector of a joint fit and the scaled vector that
 * Levenberg–Marquardt moves.
 *
 * <p>Full vector: {@code [b, Tc, c, J0, (θ0, t_r, offset) per session]}, SI units. A parameter
 * that is not free in a stage (a term not fitted, the inertia when fixed, the friction during
 * the locking stage) keeps its value in the base vector. The optimiser sees only the free
 * entries, each shifted and divided by its scale so that a unit step is a comparable change of
 * the trajectory for every parameter (their SI magnitudes span 1e-5 to 1e1). The shift matters
 * for the release time: on an absolute time base (say 1.7e9 s) the optimiser's relative step
 * test would otherwise see no change at all. Lower bounds
 * (b, Tc, c ≥ 0; J0 ≥ m Lc²) are kept by projection in the {@link #validator()}.
 */
final class ParameterLayout {

    static final int PHYSICAL = 4;
    static final int PER_SESSION = 3;

    /** The physical parameters in the order of the full vector. */
    static final List<ParameterKind> PHYSICAL_KINDS = List.of(ParameterKind.VISCOUS, ParameterKind.COULOMB,
            ParameterKind.DRAG, ParameterKind.INERTIA);

    /** The nuisance parameters in the order of a session's set. */
    static final List<ParameterKind> NUISANCE = List.of(ParameterKind.RELEASE_ANGLE, ParameterKind.RELEASE_TIME,
            ParameterKind.OFFSET);

    private final ParameterKind[] kinds;
    private final String[] names;
    private final double[] scales;
    private final double[] shifts;
    private final double[] lower;
    private final boolean[] free;
    private final int[] freeIndex;

    ParameterLayout(List<String> sessionNames, double[] scales, double[] shifts, double[] lower, boolean[] free) {
        final int size = PHYSICAL + PER_SESSION * sessionNames.size();
        this.kinds = new ParameterKind[size];
        this.names = new String[size];
        for (ParameterKind k : PHYSICAL_KINDS) {
            kinds[index(k)] = k;
            names[index(k)] = k.symbol();
        }
        for (int s = 0; s < sessionNames.size(); s++) {
            for (ParameterKind k : NUISANCE) {
                kinds[index(s, k)] = k;
                names[index(s, k)] = k.symbol() + "[" + sessionNames.get(s) + "]";
            }
        }
        this.scales = scales.clone();
        this.shifts = shifts.clone();
        this.lower = lower.clone();
        this.free = free.clone();
        this.freeIndex = indicesOf(free);
    }

    private static int[] indicesOf(boolean[] mask) {
        int n = 0;
        for (boolean b : mask) {
            n += b ? 1 : 0;
        }
        final int[] idx = new int[n];
        int j = 0;
        for (int i = 0; i < mask.length; i++) {
            if (mask[i]) {
                idx[j++] = i;
            }
        }
        return idx;
    }

    /** Index in the full vector of a nuisance parameter (θ0, t_r, offset) of session s. */
    static int index(int session, ParameterKind kind) {
        if (kind.physical()) {
            throw new IllegalArgumentException(kind + " is shared by the sessions");
        }
        return PHYSICAL + PER_SESSION * session + kind.index();
    }

    /** Index in the full vector of a physical parameter. */
    static int index(ParameterKind kind) {
        if (!kind.physical()) {
            throw new IllegalArgumentException(kind + " is per session");
        }
        return kind.index();
    }

    /** A copy with another set of free parameters. */
    ParameterLayout withFree(boolean[] mask) {
        return new ParameterLayout(kinds, names, scales, shifts, lower, mask);
    }

    private ParameterLayout(ParameterKind[] kinds, String[] names, double[] scales, double[] shifts,
            double[] lower, boolean[] free) {
        this.kinds = kinds;
        this.names = names;
        this.scales = scales;
        this.shifts = shifts;
        this.lower = lower;
        this.free = free.clone();
        this.freeIndex = indicesOf(free);
    }

    int size() {
        return kinds.length;
    }

    int sessions() {
        return (kinds.length - PHYSICAL) / PER_SESSION;
    }

    int freeCount() {
        return freeIndex.length;
    }

    /** Full index of free column j. */
    int fullIndex(int column) {
        return freeIndex[column];
    }

    /** Column of full index i, or −1 when it is not free. */
    int column(int full) {
        final int c = Arrays.binarySearch(freeIndex, full);
        return c >= 0 ? c : -1;
    }

    boolean isFree(int full) {
        return free[full];
    }

    boolean[] freeMask() {
        return free.clone();
    }

    ParameterKind kind(int full) {
        return kinds[full];
    }

    String name(int full) {
        return names[full];
    }

    double scale(int full) {
        return scales[full];
    }

    double lower(int full) {
        return lower[full];
    }

    /** The scaled free vector of a full vector. */
    RealVector scaled(double[] full) {
        final double[] u = new double[freeIndex.length];
        for (int j = 0; j < u.length; j++) {
            final int i = freeIndex[j];
            u[j] = (full[i] - shifts[i]) / scales[i];
        }
        return new ArrayRealVector(u, false);
    }

    /** The full vector: the base with its free entries replaced by the scaled vector u. */
    double[] expand(RealVector u, double[] base) {
        final double[] full = base.clone();
        for (int j = 0; j < freeIndex.length; j++) {
            final int i = freeIndex[j];
            full[i] = shifts[i] + u.getEntry(j) * scales[i];
        }
        return full;
    }

    /** Whether free parameter (full index) i sits on its lower bound. */
    boolean onBound(int full, double value) {
        return Double.isFinite(lower[full]) && value <= lower[full] + 1e-9 * scales[full];
    }

    /** Projects every free entry onto its lower bound. */
    ParameterValidator validator() {
        return point -> {
            final RealVector p = point.copy();
            for (int j = 0; j < freeIndex.length; j++) {
                final int i = freeIndex[j];
                final double bound = (lower[i] - shifts[i]) / scales[i];
                if (!(p.getEntry(j) >= bound)) {
                    p.setEntry(j, bound);
                }
            }
            return p;
        };
    }
}
