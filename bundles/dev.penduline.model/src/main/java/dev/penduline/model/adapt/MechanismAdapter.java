package dev.penduline.model.adapt;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.RotationOrder;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.model.Mechanism;
import dev.penduline.model.ShapeAxis;
import dev.penduline.model.TensorReference;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.inertia.Axis;
import dev.penduline.physics.inertia.Box;
import dev.penduline.physics.inertia.CadMassProperties;
import dev.penduline.physics.inertia.Cylinder;
import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.inertia.InertiaTensor;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.PartShape;
import dev.penduline.physics.inertia.PartTolerance;
import dev.penduline.physics.inertia.PivotAxis;
import dev.penduline.physics.inertia.PivotInertia;
import dev.penduline.physics.inertia.PointMass;
import dev.penduline.physics.inertia.SlenderRod;
import dev.penduline.physics.inertia.Sphere;
import dev.penduline.physics.inertia.ThinRing;

/**
 * Turns a mechanism file's model into the inertia engine's inputs: parts, pivot axis, gravity.
 * One direction only (model → physics); the engine never sees EMF.
 *
 * <p>Every method throws {@link IllegalArgumentException} with a message naming the part (or
 * the mechanism setting) when the model cannot be turned into physical inputs; run the
 * validation first to get all problems at once instead of the first.
 */
public final class MechanismAdapter {

    private MechanismAdapter() {
    }

    /**
     * The lumped properties the equation of motion needs.
     *
     * @param mechanism the mechanism
     * @return m, Lc, J0, θeq, g and the axis tilt
     */
    public static MechanismProperties properties(Mechanism mechanism) {
        return inertia(mechanism).toMechanismProperties();
    }

    /**
     * The inertia engine's summary for the mechanism (mass, centroid, Lc, J0, per-part shares).
     *
     * @param mechanism the mechanism
     * @return the summary about the mechanism's pivot axis
     */
    public static InertiaSummary inertia(Mechanism mechanism) {
        return pivotInertia(mechanism).compute(parts(mechanism));
    }

    /**
     * The engine configured with the mechanism's axis, gravity direction and g.
     *
     * @param mechanism the mechanism
     * @return the engine
     */
    public static PivotInertia pivotInertia(Mechanism mechanism) {
        return new PivotInertia(axis(mechanism), gravityDirection(mechanism), mechanism.getGravity());
    }

    /**
     * The pivot axis (point and direction, mechanism frame).
     *
     * @param mechanism the mechanism
     * @return the axis
     */
    public static PivotAxis axis(Mechanism mechanism) {
        return new PivotAxis(
                new Vector3D(mechanism.getAxisPointX(), mechanism.getAxisPointY(), mechanism.getAxisPointZ()),
                axisDirection(mechanism));
    }

    /**
     * The direction of gravity in the mechanism frame: the downward direction {@code d} with its
     * component along the axis removed, leaned towards the axis by the tilt α:
     * {@code cos α·d̂ − sin α·n̂}. With α = 0 this is simply the downward direction.
     *
     * @param mechanism the mechanism
     * @return a unit vector
     * @throws IllegalArgumentException when the axis is zero, the downward direction is parallel
     *                                  to the axis, or |α| ≥ π/2
     */
    public static Vector3D gravityDirection(Mechanism mechanism) {
        final Vector3D n = axisDirection(mechanism);
        if (!(n.getNorm() > 0) || n.isNaN() || n.isInfinite()) {
            throw new InvalidValueException("the pivot axis direction must be a non-zero vector, got " + n);
        }
        final Vector3D unitN = n.normalize();
        final Vector3D d = new Vector3D(mechanism.getGravityDirectionX(), mechanism.getGravityDirectionY(),
                mechanism.getGravityDirectionZ());
        final Vector3D perpendicular = d.subtract(unitN.scalarMultiply(d.dotProduct(unitN)));
        if (perpendicular.isNaN() || perpendicular.isInfinite() || perpendicular.getNorm() < 1e-12 * Math.max(1, d.getNorm())) {
            throw new InvalidValueException("the downward direction " + d
                    + " is parallel to the pivot axis (or zero): gravity would exert no restoring torque");
        }
        final double tilt = mechanism.getAxisTilt();
        if (!(Math.abs(tilt) < Math.PI / 2)) {
            throw new InvalidValueException("the axis tilt must be less than 90° in magnitude, got "
                    + Math.toDegrees(tilt) + "°");
        }
        return perpendicular.normalize().scalarMultiply(Math.cos(tilt)).subtract(unitN.scalarMultiply(Math.sin(tilt)));
    }

    /**
     * The engine's parts, in parts-list order.
     *
     * @param mechanism the mechanism
     * @return the parts
     */
    public static List<Part> parts(Mechanism mechanism) {
        final List<Part> out = new ArrayList<>(mechanism.getParts().size());
        for (dev.penduline.model.Part p : mechanism.getParts()) {
            out.add(part(p));
        }
        return out;
    }

    /**
     * One part for the engine: shape, mass (given, or density × the shape's volume), centroid,
     * orientation, cut-out flag, quantity and tolerances.
     *
     * @param p the part in the model
     * @return the engine's part
     * @throws IllegalArgumentException naming the part when it is incomplete or not physical
     */
    public static Part part(dev.penduline.model.Part p) {
        final String name = label(p);
        try {
            final Vector3D centroid = new Vector3D(p.getCentroidX(), p.getCentroidY(), p.getCentroidZ());
            final Rotation orientation = orientation(p);
            final Part base;
            if (p.getShape() == dev.penduline.model.ShapeKind.MASS_PROPERTIES) {
                base = massPropertiesPart(p, name, centroid, orientation);
            } else if (p.isSetMass()) {
                base = Part.of(name, shape(p), p.getMass(), centroid).withOrientation(orientation);
            } else if (p.isSetDensity()) {
                base = Part.ofDensity(name, shape(p), p.getDensity(), centroid).withOrientation(orientation);
            } else {
                throw new InvalidValueException("give a mass or a density");
            }
            return base.withCutout(p.isCutout()).withQuantity(p.getQuantity())
                    .withTolerance(new PartTolerance(p.getMassTolerance(), p.getDimensionTolerance()));
        } catch (InvalidValueException e) {
            final String message = e.getMessage() == null ? e.toString() : e.getMessage();
            throw new InvalidValueException(message.startsWith("part '") ? message
                    : "part '" + name + "': " + message, e);
        }
    }

    /**
     * The orientation of a part's frame: rotationX about the mechanism's x axis, then rotationY
     * about its y axis, then rotationZ about its z axis (fixed axes; R = Rz·Ry·Rx).
     *
     * <p>What the file's angles mean, in Hipparchus' terms: the three turns are vector operators
     * (each turns a vector positively, right-hand rule, about a fixed mechanism axis), so the
     * rotation is {@code RotationOrder.ZYX} with {@code RotationConvention.VECTOR_OPERATOR} and the
     * angles (rotationZ, rotationY, rotationX): Hipparchus composes that as Rz·Ry·Rx, which is the
     * same as turning about the part's own z, then its new y′, then its new x″ (intrinsic
     * z-y′-x″). Its {@code applyTo} carries a part-frame vector into the mechanism frame.
     *
     * @param p the part
     * @return the orientation R, mapping part-frame vectors into the mechanism frame
     * @throws IllegalArgumentException when an angle is not finite
     */
    public static Rotation orientation(dev.penduline.model.Part p) {
        if (p.getRotationX() == 0 && p.getRotationY() == 0 && p.getRotationZ() == 0) {
            return Rotation.IDENTITY;
        }
        for (double angle : new double[] {p.getRotationX(), p.getRotationY(), p.getRotationZ()}) {
            if (!Double.isFinite(angle)) {
                throw new InvalidValueException("rotation angle must be finite, got " + angle);
            }
        }
        return new Rotation(RotationOrder.ZYX, RotationConvention.VECTOR_OPERATOR,
                p.getRotationZ(), p.getRotationY(), p.getRotationX());
    }

    /**
     * The tensor of a tensor part as written in the file (kg·m²), about the point its
     * {@code tensorReference} names.
     *
     * @param p the part
     * @return the tensor
     */
    public static InertiaTensor givenTensor(dev.penduline.model.Part p) {
        return new InertiaTensor(p.getIxx(), p.getIyy(), p.getIzz(), p.getIxy(), p.getIxz(), p.getIyz());
    }

    /**
     * The shape of a part with a standard shape.
     *
     * @param p the part (not a tensor part)
     * @return the engine's shape
     */
    public static PartShape shape(dev.penduline.model.Part p) {
        final Axis axis = axis(p.getShapeAxis());
        return switch (p.getShape()) {
            case POINT_MASS -> new PointMass();
            case SLENDER_ROD -> new SlenderRod(p.getLength(), axis);
            case BOX -> new Box(p.getLength(), p.getWidth(), p.getHeight());
            case CYLINDER -> Cylinder.solid(p.getRadius(), p.getLength(), axis);
            case HOLLOW_CYLINDER -> new Cylinder(p.getRadius(), p.getInnerRadius(), p.getLength(), axis);
            case SPHERE -> new Sphere(p.getRadius());
            case THIN_RING -> new ThinRing(p.getRadius(), axis);
            case MASS_PROPERTIES -> throw new InvalidValueException(
                    "a tensor part has no standard shape; its tensor is given");
        };
    }

    /**
     * A name for messages: the part's name, else its identifier, else its position.
     *
     * @param p the part
     * @return the label
     */
    public static String label(dev.penduline.model.Part p) {
        if (p.getName() != null && !p.getName().isBlank()) {
            return p.getName();
        }
        if (p.getId() != null && !p.getId().isBlank()) {
            return p.getId();
        }
        final Object container = p.eContainer();
        return container instanceof Mechanism m ? "#" + (m.getParts().indexOf(p) + 1) : "(unnamed)";
    }

    private static Part massPropertiesPart(dev.penduline.model.Part p, String name, Vector3D centroid,
            Rotation orientation) {
        if (!p.isSetMass()) {
            throw new InvalidValueException("a tensor part needs its mass (a density is not enough)");
        }
        final InertiaTensor tensor = givenTensor(p);
        if (p.getTensorReference() == TensorReference.CENTROID) {
            return Part.ofTensor(name, p.getMass(), centroid, tensor).withOrientation(orientation);
        }
        // About the mechanism origin, along the part frame's axes: the centroid seen from that
        // origin, in part axes, is Rᵀ·c.
        final Vector3D local = orientation.applyInverseTo(centroid);
        return new CadMassProperties(p.getMass(), local, tensor, dev.penduline.physics.inertia.TensorReference.FRAME_ORIGIN)
                .toPart(name, orientation, Vector3D.ZERO);
    }

    private static Vector3D axisDirection(Mechanism m) {
        return new Vector3D(m.getAxisDirectionX(), m.getAxisDirectionY(), m.getAxisDirectionZ());
    }

    private static Axis axis(ShapeAxis a) {
        return switch (a) {
            case X -> Axis.X;
            case Y -> Axis.Y;
            case Z -> Axis.Z;
        };
    }
}
