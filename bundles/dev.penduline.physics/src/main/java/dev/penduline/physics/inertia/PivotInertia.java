package dev.penduline.physics.inertia;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;

/**
 * The inertia engine: reduces a parts list to mass, centroid and moment of inertia about a pivot
 * axis. Immutable; change the axis, gravity direction or g with the {@code withX} copies.
 *
 * <p>Each part contributes, about a point {@code a} on the axis of unit direction {@code n}, the
 * tensor {@code R Icg Rᵀ + m(|r|² E − r rᵀ)} with {@code r} its centroid less {@code a}
 * (three-dimensional parallel-axis theorem, e.g. Meriam &amp; Kraige, Engineering Mechanics:
 * Dynamics, Appendix B); J0 is {@code nᵀ I n} of the sum.
 *
 * @param axis             the pivot axis
 * @param gravityDirection direction of gravity (any non-zero length), −y by default
 * @param gravity          local gravitational acceleration g (m/s²)
 */
public record PivotInertia(PivotAxis axis, Vector3D gravityDirection, double gravity) {

    /** z axis through the origin, gravity along −y, standard g. */
    public static final PivotInertia DEFAULT =
            new PivotInertia(PivotAxis.Z_THROUGH_ORIGIN, Vector3D.MINUS_J, MechanismProperties.STANDARD_GRAVITY);

    /** Relative slack on J0 ≥ M Lc², as in {@link MechanismProperties}. */
    private static final double INERTIA_SLACK = 1e-9;

    /**
     * Checks the settings and normalises the gravity direction.
     *
     * @throws IllegalArgumentException for a missing axis, zero gravity direction or non-positive g
     */
    public PivotInertia {
        if (axis == null) {
            throw new IllegalArgumentException("pivot axis is missing");
        }
        if (gravityDirection == null || gravityDirection.isNaN() || gravityDirection.isInfinite()
                || !(gravityDirection.getNorm() > 0)) {
            throw new InvalidValueException("gravity direction must be a non-zero vector, got " + gravityDirection);
        }
        gravityDirection = gravityDirection.normalize();
        if (!(gravity > 0) || !Double.isFinite(gravity)) {
            throw new InvalidValueException("gravity must be positive, got " + gravity + " m/s²");
        }
    }

    /**
     * Copy about another axis.
     *
     * @param newAxis the pivot axis
     * @return the copy
     */
    public PivotInertia withAxis(PivotAxis newAxis) {
        return new PivotInertia(newAxis, gravityDirection, gravity);
    }

    /**
     * Copy with gravity pointing elsewhere in the mechanism frame.
     *
     * @param direction the direction of gravity (any non-zero length)
     * @return the copy
     */
    public PivotInertia withGravityDirection(Vector3D direction) {
        return new PivotInertia(axis, direction, gravity);
    }

    /**
     * Copy with another local g.
     *
     * @param g local gravitational acceleration (m/s²)
     * @return the copy
     */
    public PivotInertia withGravity(double g) {
        return new PivotInertia(axis, gravityDirection, g);
    }

    /**
     * Computes the mechanism's inertia about the pivot axis.
     *
     * @param parts the parts list (cut-outs included)
     * @return the summary
     * @throws IllegalArgumentException when the list is empty, the total mass is not positive or
     *         J0 &lt; M Lc²; the message names the cut-outs (or given tensors) most likely at fault
     */
    public InertiaSummary compute(List<Part> parts) {
        final Totals t = totals(parts);
        final String fatal = fatalProblem(parts, t);
        if (fatal != null) {
            throw new InvalidValueException(fatal);
        }
        return summary(parts, t);
    }

    /**
     * What {@link #problems} lists and what {@link #compute} gives, from one pass over the parts
     * (their totals summed once), for a caller that wants both.
     *
     * @param parts the parts list (cut-outs included)
     * @return the problems, the fatal one among them, and the summary when there is no fatal one
     * @throws IllegalArgumentException as {@link #compute} does for other reasons than a fatal problem
     */
    public Assessment assess(List<Part> parts) {
        final Totals t = totals(parts);
        final String fatal = fatalProblem(parts, t);
        return new Assessment(problems(parts, fatal), Optional.ofNullable(fatal),
                fatal == null ? Optional.of(summary(parts, t)) : Optional.empty());
    }

    /**
     * The outcome of {@link #assess}.
     *
     * @param problems as {@link #problems} lists them
     * @param fatal    the problem for which {@link #compute} refuses the parts, if any
     * @param summary  what {@link #compute} gives, empty when a problem is fatal
     */
    public record Assessment(List<String> problems, Optional<String> fatal, Optional<InertiaSummary> summary) {
    }

    private InertiaSummary summary(List<Part> parts, Totals t) {
        final Vector3D n = axis.direction();
        final Vector3D offset = axis.perpendicularOffset(t.centroid);
        final double lc = offset.getNorm();
        final InertiaTensor central = t.aboutAxisPoint.toCentroid(t.mass, t.centroid.subtract(axis.point()));
        final List<PartContribution> contributions = new ArrayList<>(parts.size());
        for (Part p : parts) {
            final double j = p.inertiaAbout(axis.point()).momentAbout(n);
            contributions.add(new PartContribution(p.name(), p.signedMass(), axis.distanceTo(p.centroid()), j,
                    j / t.j0));
        }
        return new InertiaSummary(t.mass, t.centroid, lc, equilibriumAngle(offset), t.j0, central.momentAbout(n),
                central, axis, gravity, axisTilt(), contributions);
    }

    /**
     * Lists everything wrong with a parts list without throwing: the fatal problems
     * {@link #compute} would refuse, inadmissible given tensors, and a vertical axis.
     *
     * @param parts the parts list
     * @return the problems, each naming the part concerned where there is one; empty when fine
     */
    public List<String> problems(List<Part> parts) {
        return problems(parts, fatalProblem(parts, totals(parts)));
    }

    private List<String> problems(List<Part> parts, String fatal) {
        final List<String> out = new ArrayList<>();
        for (Part p : parts) {
            if (p.shape() instanceof GivenTensor g) {
                for (String v : TensorCheck.violations(g.tensor())) {
                    out.add("part '" + p.name() + "': inertia tensor " + v);
                }
            }
        }
        if (fatal != null) {
            out.add(fatal);
        }
        if (Double.isNaN(equilibriumAngle(Vector3D.PLUS_I))) {
            out.add("the pivot axis is parallel to gravity: gravity exerts no restoring torque about it");
        }
        return out;
    }

    /**
     * Tilt α of the axis from horizontal: {@code sin α = |n · ĝ|}.
     *
     * @return α (rad), 0 for a level axis, π/2 for a vertical one
     */
    public double axisTilt() {
        return Math.asin(Math.min(1, Math.abs(axis.direction().dotProduct(gravityDirection))));
    }

    /** Sums over the parts, about the axis point. */
    private record Totals(double mass, Vector3D centroid, InertiaTensor aboutAxisPoint, double j0) {
    }

    private Totals totals(List<Part> parts) {
        double m = 0;
        Vector3D moment = Vector3D.ZERO;
        InertiaTensor about = InertiaTensor.ZERO;
        for (Part p : parts) {
            m += p.signedMass();
            moment = moment.add(p.centroid().scalarMultiply(p.signedMass()));
            about = about.plus(p.inertiaAbout(axis.point()));
        }
        final Vector3D c = m > 0 ? moment.scalarMultiply(1 / m) : Vector3D.ZERO;
        return new Totals(m, c, about, about.momentAbout(axis.direction()));
    }

    private String fatalProblem(List<Part> parts, Totals t) {
        if (parts.isEmpty()) {
            return "the parts list is empty";
        }
        if (!(t.mass > 0)) {
            return String.format(Locale.ROOT, "total mass %.6g kg is not positive%s", t.mass, suspects(parts, false));
        }
        final double lc = axis.distanceTo(t.centroid);
        final double bound = t.mass * lc * lc;
        if (t.j0 < bound * (1 - INERTIA_SLACK)) {
            return String.format(Locale.ROOT, "inertia about the pivot J0 = %.6g kg·m² is below M·Lc² = %.6g kg·m²:"
                    + " the inputs are inconsistent%s", t.j0, bound, suspects(parts, true));
        }
        return null;
    }

    private static String suspects(List<Part> parts, boolean includeTensors) {
        final List<String> names = new ArrayList<>();
        boolean anyCutout = false;
        for (Part p : parts) {
            if (p.cutout()) {
                names.add("cut-out '" + p.name() + "'");
                anyCutout = true;
            } else if (includeTensors && p.shape() instanceof GivenTensor g
                    && !TensorCheck.violations(g.tensor()).isEmpty()) {
                names.add("the inertia tensor of '" + p.name() + "'");
            }
        }
        if (names.isEmpty()) {
            return "";
        }
        return "; check " + String.join(", ", names)
                + (anyCutout ? " (is a cut-out larger than the solid it is cut from?)" : "");
    }

    /**
     * Angle about the axis from the straight-down direction to the given perpendicular offset.
     */
    private double equilibriumAngle(Vector3D offset) {
        final Vector3D n = axis.direction();
        final Vector3D down = gravityDirection.subtract(n.scalarMultiply(gravityDirection.dotProduct(n)));
        if (down.getNorm() < 1e-12) {
            return Double.NaN;
        }
        if (offset.getNorm() < 1e-12) {
            return 0;
        }
        return Math.atan2(n.dotProduct(down.crossProduct(offset)), down.dotProduct(offset));
    }
}
