package dev.penduline.ui.internal.editor;

import java.util.EnumSet;
import java.util.Set;

import org.eclipse.emf.ecore.EAttribute;

import dev.penduline.model.Part;
import dev.penduline.model.PendulinePackage.Literals;
import dev.penduline.model.ShapeKind;
import dev.penduline.physics.units.Quantity;

/**
 * The number columns of the parts table: the parts list's fields, each with its model attribute,
 * its quantity (for the units a value may be typed in) and the shapes that have it; a cell of a
 * shape without the field stays blank.
 */
enum PartField {
    /** Mass of one copy. */
    MASS("mass", Literals.PART__MASS, Quantity.MASS, null),
    /** Centroid x. */
    X("x", Literals.PART__CENTROID_X, Quantity.LENGTH, null),
    /** Centroid y (gravity points along −y). */
    Y("y", Literals.PART__CENTROID_Y, Quantity.LENGTH, null),
    /** Centroid z. */
    Z("z", Literals.PART__CENTROID_Z, Quantity.LENGTH, null),
    /** Length (rod, box along x, cylinder along its axis). */
    LENGTH("length", Literals.PART__LENGTH, Quantity.LENGTH,
            EnumSet.of(ShapeKind.SLENDER_ROD, ShapeKind.BOX, ShapeKind.CYLINDER, ShapeKind.HOLLOW_CYLINDER)),
    /** Width (box, along y). */
    WIDTH("width", Literals.PART__WIDTH, Quantity.LENGTH, EnumSet.of(ShapeKind.BOX)),
    /** Height (box, along z). */
    HEIGHT("height", Literals.PART__HEIGHT, Quantity.LENGTH, EnumSet.of(ShapeKind.BOX)),
    /** Radius. */
    RADIUS("radius", Literals.PART__RADIUS, Quantity.LENGTH,
            EnumSet.of(ShapeKind.CYLINDER, ShapeKind.HOLLOW_CYLINDER, ShapeKind.SPHERE, ShapeKind.THIN_RING)),
    /** Inner radius of a hollow cylinder. */
    INNER_RADIUS("inner radius", Literals.PART__INNER_RADIUS, Quantity.LENGTH, EnumSet.of(ShapeKind.HOLLOW_CYLINDER)),
    /** Given tensor, xx. */
    IXX("ixx", Literals.PART__IXX, Quantity.INERTIA, EnumSet.of(ShapeKind.MASS_PROPERTIES)),
    /** Given tensor, yy. */
    IYY("iyy", Literals.PART__IYY, Quantity.INERTIA, EnumSet.of(ShapeKind.MASS_PROPERTIES)),
    /** Given tensor, zz. */
    IZZ("izz", Literals.PART__IZZ, Quantity.INERTIA, EnumSet.of(ShapeKind.MASS_PROPERTIES)),
    /** Given tensor, xy (the tensor element, −∫xy dm). */
    IXY("ixy", Literals.PART__IXY, Quantity.INERTIA, EnumSet.of(ShapeKind.MASS_PROPERTIES)),
    /** Given tensor, xz. */
    IXZ("ixz", Literals.PART__IXZ, Quantity.INERTIA, EnumSet.of(ShapeKind.MASS_PROPERTIES)),
    /** Given tensor, yz. */
    IYZ("iyz", Literals.PART__IYZ, Quantity.INERTIA, EnumSet.of(ShapeKind.MASS_PROPERTIES)),
    /** ± mass tolerance. */
    MASS_TOLERANCE("mass tol", Literals.PART__MASS_TOLERANCE, Quantity.MASS, null),
    /** ± dimension tolerance. */
    DIMENSION_TOLERANCE("dim tol", Literals.PART__DIMENSION_TOLERANCE, Quantity.LENGTH, null);

    private final String title;
    private final EAttribute attribute;
    private final Quantity quantity;
    private final Set<ShapeKind> shapes;

    PartField(String title, EAttribute attribute, Quantity quantity, Set<ShapeKind> shapes) {
        this.title = title;
        this.attribute = attribute;
        this.quantity = quantity;
        this.shapes = shapes;
    }

    /** @return the column header, with the SI unit the cells show */
    String header() {
        return title + " (" + quantity.siSymbol() + ")";
    }

    /** @return the field's name in messages and command labels */
    String title() {
        return title;
    }

    /** @return the model attribute */
    EAttribute attribute() {
        return attribute;
    }

    /** @return the quantity */
    Quantity quantity() {
        return quantity;
    }

    /**
     * Whether a part of this shape has the field.
     *
     * @param part the part
     * @return true when the cell applies
     */
    boolean appliesTo(Part part) {
        return shapes == null || shapes.contains(part.getShape());
    }

    /**
     * The cell's text.
     *
     * @param part the part
     * @return the value with its SI unit, blank when the shape lacks the field or it is unset
     */
    String text(Part part) {
        if (!appliesTo(part) || (attribute.isUnsettable() && !part.eIsSet(attribute))) {
            return "";
        }
        return UnitText.format((Double) part.eGet(attribute), quantity);
    }
}
