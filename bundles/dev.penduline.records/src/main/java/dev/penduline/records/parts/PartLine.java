package dev.penduline.records.parts;

import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.physics.InputMessage;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.inertia.Axis;
import dev.penduline.physics.inertia.Box;
import dev.penduline.physics.inertia.Cylinder;
import dev.penduline.physics.inertia.InertiaTensor;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.PartShape;
import dev.penduline.physics.inertia.PartTolerance;
import dev.penduline.physics.inertia.PointMass;
import dev.penduline.physics.inertia.SlenderRod;
import dev.penduline.physics.inertia.Sphere;
import dev.penduline.physics.inertia.TensorCheck;
import dev.penduline.physics.inertia.ThinRing;
import dev.penduline.records.PlainText;
import dev.penduline.records.RecordFormatException;

/** Turns one data line of a parts list into a {@link Part}. */
final class PartLine {

    /** The largest number of identical parts on one line. */
    static final int MAX_QUANTITY = 1_000_000;
    private static final List<String> SHAPES = List.of("point", "rod", "box", "cylinder", "sphere", "ring", "tensor");
    private static final Set<PartsColumn> GEOMETRY = EnumSet.of(PartsColumn.LENGTH, PartsColumn.WIDTH,
            PartsColumn.HEIGHT, PartsColumn.RADIUS, PartsColumn.INNER_RADIUS, PartsColumn.AXIS, PartsColumn.IXX,
            PartsColumn.IYY, PartsColumn.IZZ, PartsColumn.IXY, PartsColumn.IXZ, PartsColumn.IYZ);
    private static final List<PartsColumn> TENSOR = List.of(PartsColumn.IXX, PartsColumn.IYY, PartsColumn.IZZ,
            PartsColumn.IXY, PartsColumn.IXZ, PartsColumn.IYZ);

    private PartLine() {
    }

    static Part toPart(PartsRow row, List<String> warnings) throws RecordFormatException {
        if (row.hasExtraCells()) {
            throw new RecordFormatException(row.file(), row.line(), null,
                    InputMessage.MORE_FIELDS_THAN_HEADER.format());
        }
        final String name = row.text(PartsColumn.NAME)
                .orElseThrow(() -> row.error(PartsColumn.NAME, InputMessage.EMPTY_PART_NAME.format()));
        final Optional<String> bad = PlainText.nameProblem(name);
        if (bad.isPresent()) {
            throw row.error(PartsColumn.NAME, bad.get());
        }
        final String typed = row.text(PartsColumn.SHAPE)
                .orElseThrow(() -> row.error(PartsColumn.SHAPE, InputMessage.EMPTY_SHAPE.format(String.join(", ", SHAPES))));
        final String kind = typed.toLowerCase(Locale.ROOT);
        final String why = "by a " + kind;
        final Set<PartsColumn> used = EnumSet.noneOf(PartsColumn.class);
        final PartShape shape = switch (kind) {
            case "point" -> new PointMass();
            case "rod" -> new SlenderRod(length(row, why, used), axis(row, why, used));
            case "box" -> box(row, why, used);
            case "cylinder" -> cylinder(row, why, used);
            case "sphere" -> new Sphere(positive(row, PartsColumn.RADIUS, why, used));
            case "ring" -> new ThinRing(positive(row, PartsColumn.RADIUS, why, used), axis(row, why, used));
            case "tensor" -> null;
            default -> throw row.error(PartsColumn.SHAPE, InputMessage.NOT_A_SHAPE.format(typed,
                    String.join(", ", SHAPES)));
        };
        for (PartsColumn c : GEOMETRY) {
            if (!used.contains(c) && row.isFilled(c) && !(shape == null && TENSOR.contains(c))) {
                warnings.add(row.file() + ":" + row.line() + ": column '" + PlainText.visible(row.headerName(c))
                        + "' is not used by a " + kind + " and is ignored");
            }
        }
        final Vector3D centroid = new Vector3D(coordinate(row, PartsColumn.X), coordinate(row, PartsColumn.Y),
                coordinate(row, PartsColumn.Z));
        final double mass = mass(row, shape, kind);
        final Part base = shape == null
                ? Part.ofTensor(name, mass, centroid, tensor(row))
                : new Part(name, shape, mass, centroid, Rotation.IDENTITY, false, 1, PartTolerance.NONE);
        return base.withCutout(cutout(row)).withQuantity(quantity(row))
                .withTolerance(new PartTolerance(row.nonNegative(PartsColumn.MASS_TOL), row.nonNegative(PartsColumn.DIM_TOL)));
    }

    private static double coordinate(PartsRow row, PartsColumn c) throws RecordFormatException {
        return row.required(c, "for the part's centroid");
    }

    private static double positive(PartsRow row, PartsColumn c, String why, Set<PartsColumn> used)
            throws RecordFormatException {
        used.add(c);
        return row.requiredPositive(c, why);
    }

    private static double length(PartsRow row, String why, Set<PartsColumn> used) throws RecordFormatException {
        return positive(row, PartsColumn.LENGTH, why, used);
    }

    private static Axis axis(PartsRow row, String why, Set<PartsColumn> used) throws RecordFormatException {
        used.add(PartsColumn.AXIS);
        final String t = row.text(PartsColumn.AXIS)
                .orElseThrow(() -> row.error(PartsColumn.AXIS, InputMessage.EMPTY_AXIS.format(why)));
        try {
            return Axis.parse(t);
        } catch (InvalidValueException e) {
            throw row.error(PartsColumn.AXIS, e.getMessage());
        }
    }

    private static Box box(PartsRow row, String why, Set<PartsColumn> used) throws RecordFormatException {
        final double a = positive(row, PartsColumn.LENGTH, why, used);
        final double b = positive(row, PartsColumn.WIDTH, why, used);
        final double c = positive(row, PartsColumn.HEIGHT, why, used);
        return new Box(a, b, c);
    }

    private static Cylinder cylinder(PartsRow row, String why, Set<PartsColumn> used) throws RecordFormatException {
        final double r = positive(row, PartsColumn.RADIUS, why, used);
        used.add(PartsColumn.INNER_RADIUS);
        final double ri = row.nonNegative(PartsColumn.INNER_RADIUS);
        if (ri >= r) {
            throw row.error(PartsColumn.INNER_RADIUS, InputMessage.INNER_RADIUS_TOO_LARGE.format(
                    row.text(PartsColumn.INNER_RADIUS).orElse(""), row.text(PartsColumn.RADIUS).orElse("")));
        }
        return new Cylinder(r, ri, length(row, why, used), axis(row, why, used));
    }

    private static InertiaTensor tensor(PartsRow row) throws RecordFormatException {
        final double[] v = new double[TENSOR.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = row.required(TENSOR.get(i), "by a tensor");
        }
        final InertiaTensor t = new InertiaTensor(v[0], v[1], v[2], v[3], v[4], v[5]);
        final List<String> problems = TensorCheck.violations(t);
        if (!problems.isEmpty()) {
            throw new RecordFormatException(row.file(), row.line(), null,
                    InputMessage.TENSOR_NOT_PHYSICAL.format(String.join("; ", problems)));
        }
        return t;
    }

    private static double mass(PartsRow row, PartShape shape, String kind) throws RecordFormatException {
        final OptionalDouble mass = row.number(PartsColumn.MASS);
        final OptionalDouble density = row.number(PartsColumn.DENSITY);
        if (mass.isPresent() && density.isPresent()) {
            throw row.error(PartsColumn.MASS, InputMessage.MASS_AND_DENSITY.format(
                    row.headerName(PartsColumn.DENSITY)));
        }
        if (mass.isPresent()) {
            row.requirePositive(PartsColumn.MASS, mass.getAsDouble());
            return mass.getAsDouble();
        }
        if (density.isEmpty()) {
            throw row.error(PartsColumn.MASS, InputMessage.EMPTY_MASS.format());
        }
        row.requirePositive(PartsColumn.DENSITY, density.getAsDouble());
        if (shape == null || shape.volume().isEmpty()) {
            throw row.error(PartsColumn.DENSITY, InputMessage.NO_VOLUME_FOR_DENSITY.format(kind,
                    row.headerName(PartsColumn.MASS)));
        }
        return density.getAsDouble() * shape.volume().getAsDouble();
    }

    private static boolean cutout(PartsRow row) throws RecordFormatException {
        final String t = row.text(PartsColumn.CUTOUT).orElse("false");
        return switch (t.toLowerCase(Locale.ROOT)) {
            case "true" -> true;
            case "false" -> false;
            default -> throw row.error(PartsColumn.CUTOUT, InputMessage.NOT_TRUE_OR_FALSE.format(t));
        };
    }

    private static int quantity(PartsRow row) throws RecordFormatException {
        final String t = row.text(PartsColumn.QUANTITY).orElse("1");
        try {
            final int q = Integer.parseInt(t);
            if (q >= 1 && q <= MAX_QUANTITY) {
                return q;
            }
        } catch (NumberFormatException e) {
            // reported below with the file, line and column
        }
        throw row.error(PartsColumn.QUANTITY, InputMessage.NOT_A_QUANTITY.format(t, MAX_QUANTITY));
    }
}
