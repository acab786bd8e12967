package dev.penduline.model.validation;

import java.util.List;
import java.util.Locale;

import org.eclipse.emf.ecore.EAttribute;

import dev.penduline.model.Part;
import dev.penduline.model.PendulinePackage.Literals;
import dev.penduline.model.ShapeKind;
import dev.penduline.model.TensorReference;
import dev.penduline.model.adapt.MechanismAdapter;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.inertia.GivenTensor;
import dev.penduline.physics.inertia.TensorCheck;

/** The rules of one part. */
final class PartRules {

    private PartRules() {
    }

    static void check(Part p, Problems out) {
        final String who = "part '" + MechanismAdapter.label(p) + "'";
        if (Problems.blank(p.getId())) {
            out.error(MechanismRule.IDENTIFIER, p, Literals.PART__ID, who + ": has no identifier");
        }
        if (Problems.blank(p.getName())) {
            out.warning(MechanismRule.NAME, p, Literals.PART__NAME, who + ": has no name");
        }
        mass(p, who, out);
        dimensions(p, who, out);
        if (p.getQuantity() < 1) {
            out.error(MechanismRule.QUANTITY, p, Literals.PART__QUANTITY,
                    who + ": quantity must be at least 1 (got " + p.getQuantity() + ")");
        }
        notNegative(p, Literals.PART__MASS_TOLERANCE, p.getMassTolerance(), "mass tolerance", "kg", who, out);
        notNegative(p, Literals.PART__DIMENSION_TOLERANCE, p.getDimensionTolerance(), "dimension tolerance", "m",
                who, out);
        finite(p, who, out, Literals.PART__CENTROID_X, Literals.PART__CENTROID_Y, Literals.PART__CENTROID_Z,
                Literals.PART__ROTATION_X, Literals.PART__ROTATION_Y, Literals.PART__ROTATION_Z);
        if (p.getShape() == ShapeKind.MASS_PROPERTIES) {
            tensor(p, who, out);
        }
    }

    private static void mass(Part p, String who, Problems out) {
        final boolean tensorPart = p.getShape() == ShapeKind.MASS_PROPERTIES;
        if (p.isSetMass() && p.isSetDensity()) {
            out.error(MechanismRule.MASS, p, Literals.PART__DENSITY,
                    who + ": give either a mass or a density, not both");
        } else if (!p.isSetMass() && !p.isSetDensity()) {
            out.error(MechanismRule.MASS, p, Literals.PART__MASS, who + ": give a mass"
                    + (tensorPart ? "" : " or a density"));
        } else if (p.isSetDensity() && tensorPart) {
            out.error(MechanismRule.MASS, p, Literals.PART__DENSITY,
                    who + ": mass properties need the mass itself, not a density");
        } else if (p.isSetDensity() && (p.getShape() == ShapeKind.POINT_MASS || p.getShape() == ShapeKind.THIN_RING)) {
            out.error(MechanismRule.MASS, p, Literals.PART__DENSITY,
                    who + ": a " + shapeName(p.getShape()) + " has no volume, so give its mass, not a density");
        }
        if (p.isSetMass() && !Problems.positive(p.getMass())) {
            out.error(MechanismRule.MASS, p, Literals.PART__MASS, who + ": mass must be positive (got " + p.getMass()
                    + " kg)" + (p.isCutout() ? "; a cut-out has the positive mass of the removed material"
                            : "; for a hole, give the removed material's positive mass and mark it as a cut-out"));
        }
        if (p.isSetDensity() && !Problems.positive(p.getDensity())) {
            out.error(MechanismRule.MASS, p, Literals.PART__DENSITY,
                    who + ": density must be positive (got " + p.getDensity() + " kg/m³)");
        }
    }

    private static void dimensions(Part p, String who, Problems out) {
        final ShapeKind shape = p.getShape();
        switch (shape) {
            case SLENDER_ROD -> positive(p, Literals.PART__LENGTH, p.getLength(), "length", who, out);
            case BOX -> {
                positive(p, Literals.PART__LENGTH, p.getLength(), "length", who, out);
                positive(p, Literals.PART__WIDTH, p.getWidth(), "width", who, out);
                positive(p, Literals.PART__HEIGHT, p.getHeight(), "height", who, out);
            }
            case CYLINDER -> {
                positive(p, Literals.PART__RADIUS, p.getRadius(), "radius", who, out);
                positive(p, Literals.PART__LENGTH, p.getLength(), "length", who, out);
            }
            case HOLLOW_CYLINDER -> {
                positive(p, Literals.PART__RADIUS, p.getRadius(), "radius", who, out);
                positive(p, Literals.PART__INNER_RADIUS, p.getInnerRadius(), "inner radius", who, out);
                positive(p, Literals.PART__LENGTH, p.getLength(), "length", who, out);
                if (Problems.positive(p.getInnerRadius()) && p.getInnerRadius() >= p.getRadius()) {
                    out.error(MechanismRule.DIMENSION, p, Literals.PART__INNER_RADIUS, who + ": inner radius "
                            + p.getInnerRadius() + " m must be less than the radius " + p.getRadius() + " m");
                }
            }
            case SPHERE, THIN_RING -> positive(p, Literals.PART__RADIUS, p.getRadius(), "radius", who, out);
            case POINT_MASS, MASS_PROPERTIES -> {
                // No dimensions.
            }
        }
    }

    private static void tensor(Part p, String who, Problems out) {
        final boolean aboutOrigin = p.getTensorReference() == TensorReference.FRAME_ORIGIN;
        final List<String> given = TensorCheck.violations(MechanismAdapter.givenTensor(p));
        for (String v : given) {
            out.error(MechanismRule.TENSOR, p, Literals.PART__IXX,
                    who + ": inertia tensor " + (aboutOrigin ? "about the frame origin " : "") + v);
        }
        if (!aboutOrigin || !given.isEmpty() || !p.isSetMass() || !Problems.positive(p.getMass())) {
            return;
        }
        // A tensor about the origin may be admissible while the centroid or mass given with it are
        // not: moved to the centroid (parallel-axis theorem) it must still be physical.
        try {
            if (MechanismAdapter.part(p).shape() instanceof GivenTensor g) {
                for (String v : TensorCheck.violations(g.tensor())) {
                    out.error(MechanismRule.TENSOR, p, Literals.PART__IXX, who + ": inertia tensor moved to the"
                            + " centroid " + v + " (are the mass and centroid those of this tensor?)");
                }
            }
        } catch (InvalidValueException e) {
            // Reported by the other rules of this part.
        }
    }

    private static void positive(Part p, EAttribute feature, double value, String what, String who, Problems out) {
        if (!Problems.positive(value)) {
            out.error(MechanismRule.DIMENSION, p, feature, who + ": " + what + " must be positive for a "
                    + shapeName(p.getShape()) + " (got " + value + " m)");
        }
    }

    private static void notNegative(Part p, EAttribute feature, double value, String what, String unit, String who,
            Problems out) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            out.error(MechanismRule.TOLERANCE, p, feature,
                    who + ": " + what + " must be zero or positive (got " + value + " " + unit + ")");
        }
    }

    private static void finite(Part p, String who, Problems out, EAttribute... features) {
        for (EAttribute f : features) {
            final double v = (Double) p.eGet(f);
            if (!Double.isFinite(v)) {
                out.error(MechanismRule.POSITION, p, f, who + ": " + f.getName() + " must be a finite number (got "
                        + v + ")");
            }
        }
    }

    static String shapeName(ShapeKind shape) {
        return shape.getLiteral().replace('-', ' ').toLowerCase(Locale.ROOT);
    }
}
