package dev.penduline.services;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.inertia.Box;
import dev.penduline.physics.inertia.Cylinder;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.PartShape;
import dev.penduline.physics.inertia.SlenderRod;
import dev.penduline.physics.inertia.Sphere;
import dev.penduline.physics.inertia.ThinRing;
import dev.penduline.physics.units.Quantity;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.PlainText;
import dev.penduline.records.RecordFormatException;
import dev.penduline.records.parts.PartsListReader;

/**
 * What-if changes of a mechanism's parts, without editing its file: {@code PART.FIELD=VALUE}
 * settings (a value in SI, or with a unit suffix the parts list accepts: {@code 12mm},
 * {@code 0.5lb}), parts removed by name, and parts added from a parts list.
 *
 * <p>Fields: {@code mass}, {@code x}, {@code y}, {@code z} (the centroid), {@code length},
 * {@code width}, {@code height}, {@code radius}, {@code inner_radius} (as the part's shape has
 * them, with the parts list's meaning) and {@code quantity}.
 */
public final class PartChanges {

    /**
     * One setting.
     *
     * @param text  as the user typed it
     * @param part  the part's name
     * @param field the field
     * @param value the new value (SI)
     */
    public record Setting(String text, String part, String field, double value) {
    }

    private static final Pattern SETTING = Pattern.compile("(.+)\\.([a-z_]+)=\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)"
            + "\\s*([A-Za-z_0-9]*)\\s*");
    private static final List<String> LENGTHS = List.of("x", "y", "z", "length", "width", "height", "radius", "inner_radius");

    private PartChanges() {
    }

    /**
     * Reads one setting.
     *
     * @param text {@code PART.FIELD=VALUE[UNIT]}
     * @return the setting
     * @throws InputException naming what is wrong and the accepted form
     */
    public static Setting parse(String text) throws InputException {
        Matcher m = SETTING.matcher(text);
        if (!m.matches()) {
            throw new InputException("what-if '" + shown(text) + "' is not PART.FIELD=VALUE (e.g. handle.mass=0.35kg or"
                    + " rib.y=-120mm)");
        }
        String field = m.group(2);
        Quantity quantity;
        if ("mass".equals(field)) {
            quantity = Quantity.MASS;
        } else if (LENGTHS.contains(field)) {
            quantity = Quantity.LENGTH;
        } else if ("quantity".equals(field)) {
            quantity = null;
        } else {
            throw new InputException("what-if '" + shown(text) + "': no field '" + field + "'; the fields are mass, quantity, "
                    + String.join(", ", LENGTHS));
        }
        double value = Double.parseDouble(m.group(3));
        String suffix = m.group(4);
        if (quantity == null) {
            if (!suffix.isEmpty() || value != Math.rint(value) || value < 1 || value > 1e6) {
                throw new InputException("what-if '" + shown(text) + "': a quantity is a whole number from 1 to 1000000");
            }
        } else if (!suffix.isEmpty()) {
            Optional<Unit> unit = Unit.forSuffix(suffix.toLowerCase(Locale.ROOT));
            if (unit.isEmpty() || unit.get().quantity() != quantity) {
                throw new InputException("what-if '" + shown(text) + "': '" + suffix + "' is not a unit of "
                        + quantity.name().toLowerCase(Locale.ROOT) + (quantity == Quantity.MASS ? " (kg, g, lb)"
                                : " (m, mm, cm, in, ft)"));
            }
            value = unit.get().toSi(value);
        }
        return new Setting(text, m.group(1), field, value);
    }

    /**
     * Applies the changes.
     *
     * @param parts    the parts
     * @param settings the settings, in order
     * @param removed  names of parts to remove
     * @param added    parts lists whose parts are added
     * @return the changed parts
     * @throws InputException naming a part that does not exist, a field its shape lacks, or an
     *                        unreadable parts list
     */
    public static List<Part> apply(List<Part> parts, List<Setting> settings, List<String> removed, List<Path> added)
            throws InputException {
        List<Part> out = new ArrayList<>(parts);
        for (String name : removed) {
            if (!out.removeIf(p -> p.name().equals(name))) {
                throw new InputException("what-if: --remove '" + shown(name) + "': no part of that name; the parts are "
                        + names(out));
            }
        }
        for (Setting s : settings) {
            int index = -1;
            for (int i = 0; i < out.size(); i++) {
                if (out.get(i).name().equals(s.part())) {
                    index = i;
                }
            }
            if (index < 0) {
                throw new InputException("what-if '" + shown(s.text()) + "': no part '" + shown(s.part()) + "'; the parts are "
                        + names(out));
            }
            try {
                out.set(index, changed(out.get(index), s));
            } catch (InvalidValueException e) {
                throw new InputException("what-if '" + shown(s.text()) + "': " + e.getMessage(), e);
            }
        }
        for (Path file : added) {
            try {
                out.addAll(new PartsListReader().read(file).parts());
            } catch (RecordFormatException e) {
                throw new InputException(e.getMessage(), e);
            } catch (IOException e) {
                throw new InputException(file + ": cannot be read (" + e.getMessage() + ")", e);
            }
        }
        return out;
    }

    private static Part changed(Part p, Setting s) {
        double v = s.value();
        Vector3D c = p.centroid();
        return switch (s.field()) {
            case "mass" -> p.withMass(v);
            case "quantity" -> p.withQuantity((int) v);
            case "x" -> p.withCentroid(new Vector3D(v, c.getY(), c.getZ()));
            case "y" -> p.withCentroid(new Vector3D(c.getX(), v, c.getZ()));
            case "z" -> p.withCentroid(new Vector3D(c.getX(), c.getY(), v));
            default -> p.withShape(reshaped(p.shape(), s.field(), v));
        };
    }

    private static PartShape reshaped(PartShape shape, String field, double v) {
        PartShape out = switch (shape) {
            case SlenderRod r when "length".equals(field) -> new SlenderRod(v, r.axis());
            case Box b when "length".equals(field) -> new Box(v, b.widthY(), b.heightZ());
            case Box b when "width".equals(field) -> new Box(b.lengthX(), v, b.heightZ());
            case Box b when "height".equals(field) -> new Box(b.lengthX(), b.widthY(), v);
            case Cylinder c when "radius".equals(field) -> new Cylinder(v, c.innerRadius(), c.length(), c.axis());
            case Cylinder c when "inner_radius".equals(field) -> new Cylinder(c.radius(), v, c.length(), c.axis());
            case Cylinder c when "length".equals(field) -> new Cylinder(c.radius(), c.innerRadius(), v, c.axis());
            case Sphere s when "radius".equals(field) -> new Sphere(v);
            case ThinRing r when "radius".equals(field) -> new ThinRing(v, r.axis());
            default -> null;
        };
        if (out == null) {
            throw new InvalidValueException("a " + shape.kind() + " has no " + field);
        }
        return out;
    }

    private static String names(List<Part> parts) {
        List<String> names = parts.stream().map(Part::name).distinct().toList();
        return names.size() > 12 ? String.join(", ", names.subList(0, 12)) + ", ..." : String.join(", ", names);
    }

    private static String shown(String text) {
        String s = PlainText.visible(text);
        return s.length() > 60 ? s.substring(0, 57) + "..." : s;
    }
}
