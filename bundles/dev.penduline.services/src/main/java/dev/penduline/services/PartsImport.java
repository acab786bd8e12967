package dev.penduline.services;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.model.PendulineFactory;
import dev.penduline.model.Setting;
import dev.penduline.model.ShapeAxis;
import dev.penduline.model.ShapeKind;
import dev.penduline.model.TensorReference;
import dev.penduline.model.adapt.MechanismAdapter;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.inertia.Axis;
import dev.penduline.physics.inertia.Box;
import dev.penduline.physics.inertia.Cylinder;
import dev.penduline.physics.inertia.GivenTensor;
import dev.penduline.physics.inertia.InertiaTensor;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.PointMass;
import dev.penduline.physics.inertia.SlenderRod;
import dev.penduline.physics.inertia.Sphere;
import dev.penduline.physics.inertia.ThinRing;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.PlainText;
import dev.penduline.records.RecordFormatException;
import dev.penduline.records.parts.PartsList;
import dev.penduline.records.parts.PartsListReader;
import dev.penduline.services.present.Figures;

/**
 * Turns a parts list (a BOM or CAD export read by the parts-list reader) into a mechanism file,
 * so that the project carries its parts, versioned next to the CAD. Masses are stored as the
 * list gave them or as density × volume; dimensions, positions and tensors in SI.
 */
public final class PartsImport {

    private static final MathContext TWELVE_DIGITS = new MathContext(12);

    private PartsImport() {
    }

    /**
     * Creates a mechanism holding the parts of a list.
     *
     * @param name  the mechanism's name
     * @param parts the parts as read
     * @return the new mechanism (not saved)
     */
    public static Mechanism toMechanism(String name, PartsList parts) {
        Mechanism m = NamedElements.mechanism(name);
        m.setDescription("Imported from " + Path.of(parts.source()).getFileName());
        for (Part p : parts.parts()) {
            add(m, p);
        }
        return m;
    }

    /**
     * Writes a new mechanism file from a parts list; refuses to overwrite an existing file.
     *
     * @param name   the mechanism's name
     * @param parts  the parts as read
     * @param target the mechanism file to create
     * @throws InputException when the target exists or cannot be written
     */
    public static void write(String name, PartsList parts, Path target) throws InputException {
        write(name, parts, target, note -> { });
    }

    /**
     * Writes a new mechanism file from a parts list; refuses to overwrite an existing file.
     *
     * @param name   the mechanism's name
     * @param parts  the parts as read
     * @param target the mechanism file to create
     * @param notes  receives notes of the save for the user
     * @throws InputException when the target exists or cannot be written
     */
    public static void write(String name, PartsList parts, Path target, Consumer<String> notes) throws InputException {
        write(name, parts, target, MechanismProperties.STANDARD_GRAVITY, notes);
    }

    /**
     * Writes a new mechanism file from a parts list for a given local gravity; refuses to
     * overwrite an existing file.
     *
     * @param name    the mechanism's name
     * @param parts   the parts as read
     * @param target  the mechanism file to create
     * @param gravity the mechanism's local gravity (m/s²)
     * @param notes   receives notes of the save for the user
     * @throws InputException when the target exists or cannot be written
     */
    public static void write(String name, PartsList parts, Path target, double gravity, Consumer<String> notes)
            throws InputException {
        Optional<String> badName = PlainText.nameProblem(name);
        if (badName.isPresent()) {
            throw new InputException("the mechanism's name " + badName.get());
        }
        Mechanism m = toMechanism(name, parts);
        m.setGravity(gravity);
        MechanismStore.createNew(m, target, notes);
    }

    /**
     * Reads a parts-list CSV and writes it as a new mechanism file.
     *
     * @param partsList the parts-list CSV
     * @param target    the mechanism file to create (must not exist)
     * @param name      the mechanism's name
     * @return the warnings of reading the list (ignored columns and the like) and the notes of
     *         the save
     * @throws InputException when the list is bad, or the target exists or cannot be written
     */
    public static List<String> importFile(Path partsList, Path target, String name) throws InputException {
        return importFile(partsList, target, name, MechanismProperties.STANDARD_GRAVITY);
    }

    /**
     * Reads a parts-list CSV and writes it as a new mechanism file for a given local gravity (the
     * user's default, {@link Defaults#gravity()}); standard gravity is not written, as the
     * file format's default.
     *
     * @param partsList the parts-list CSV
     * @param target    the mechanism file to create (must not exist)
     * @param name      the mechanism's name
     * @param gravity   the mechanism's local gravity (m/s²)
     * @return the warnings of reading the list and the notes of the save
     * @throws InputException when the list is bad, or the target exists or cannot be written
     */
    public static List<String> importFile(Path partsList, Path target, String name, double gravity) throws InputException {
        PartsList parts = readPartsList(partsList);
        List<String> said = new ArrayList<>(parts.warnings());
        write(name, parts, target, gravity, said::add);
        return said;
    }

    /**
     * Replaces the parts of an existing mechanism file with those of a parts list, keeping its
     * sessions and stored fits; every fit stored before is marked stale (a {@code stale} setting
     * saying when and how the calculated J0 moved), since it was made with the old parts. The
     * change is made under the file's lock on its current content.
     *
     * @param partsList the parts-list CSV
     * @param target    the mechanism file (must exist)
     * @param when      when the parts were replaced (for the stale marks)
     * @return the warnings of reading the list, what was done, and the notes of the save
     * @throws InputException when the list is bad or the file cannot be read, changed or saved
     */
    public static List<String> replaceParts(Path partsList, Path target, Instant when) throws InputException {
        PartsList parts = readPartsList(partsList);
        List<String> said = new ArrayList<>(parts.warnings());
        String stamp = when.truncatedTo(ChronoUnit.SECONDS).toString();
        int marked = MechanismStore.update(target, m -> {
            double before = calculatedInertia(m);
            m.getParts().clear();
            for (Part p : parts.parts()) {
                add(m, p);
            }
            double after = calculatedInertia(m);
            return markFitsStale(m, staleBecause("parts replaced from " + Path.of(parts.source()).getFileName(), stamp,
                    "", before, after));
        }, said::add);
        said.add(String.format(Locale.ROOT, "replaced the parts of %s with the %d of %s; kept its sessions and"
                + " fits%s", target, parts.parts().size(), partsList, marked == 0 ? "" : ", and marked the " + marked
                + " stored fit(s) stale"));
        return said;
    }

    /**
     * Why the stored fits became stale, in the words of their {@link #STALE} setting: what changed
     * and when, and the calculated J0 before and after (six significant digits, so that a small
     * change shows).
     *
     * @param change what changed, e.g. "parts replaced from new.csv"
     * @param stamp  when, an ISO-8601 instant
     * @param detail more about the change (the edit's label), or empty
     * @param before the calculated J0 before (kg·m²)
     * @param after  the calculated J0 after (kg·m²)
     * @return the reason
     */
    public static String staleBecause(String change, String stamp, String detail, double before, double after) {
        return change + " at " + stamp + " (" + (detail.isEmpty() ? "" : detail + "; ") + "calculated J0 "
                + Figures.significant(before, 6) + " -> " + Figures.significant(after, 6) + " " + Unit.KG_M2.symbol()
                + "): this fit was made with the parts before";
    }

    /** The setting key that marks a stored fit made with parts that have changed since. */
    public static final String STALE = "stale";

    /**
     * Marks every fit stored in a mechanism as stale (its {@code stale} setting, added or
     * replaced), because the parts it was made with have changed.
     *
     * @param m   the mechanism
     * @param why what changed and when, as the setting's value
     * @return how many fits were marked
     */
    public static int markFitsStale(Mechanism m, String why) {
        return markFitsStale(m, why, false);
    }

    /**
     * Marks the fits stored in a mechanism as stale.
     *
     * @param m            the mechanism
     * @param why          what changed and when, as the setting's value
     * @param keepEarlier  leave a fit that is stale already with its first reason (the change that
     *                     first left it behind), instead of replacing it
     * @return how many fits were marked now
     */
    public static int markFitsStale(Mechanism m, String why, boolean keepEarlier) {
        int marked = 0;
        for (FitResult r : m.getFitResults()) {
            Setting stale = r.getSettings().stream().filter(x -> STALE.equals(x.getKey())).findFirst().orElse(null);
            if (stale != null && keepEarlier) {
                continue;
            }
            marked++;
            if (stale == null) {
                stale = PendulineFactory.eINSTANCE.createSetting();
                stale.setKey(STALE);
                r.getSettings().add(stale);
            }
            stale.setValue(why);
        }
        return marked;
    }

    /**
     * Why a stored fit is stale, if it is.
     *
     * @param fit the stored fit
     * @return its {@code stale} setting's text, empty when the fit is current
     */
    public static Optional<String> staleReason(FitResult fit) {
        return fit.getSettings().stream().filter(x -> STALE.equals(x.getKey())).map(Setting::getValue).findFirst();
    }

    /**
     * The pivot inertia the mechanism's parts give now.
     *
     * @param m the mechanism
     * @return J0 (kg·m²), NaN when the parts cannot be computed
     */
    public static double calculatedInertia(Mechanism m) {
        try {
            return MechanismAdapter.inertia(m).pivotInertia();
        } catch (InvalidValueException e) {
            return Double.NaN;
        }
    }

    /**
     * Reads a parts list.
     *
     * @param partsList the CSV file
     * @return its parts and the reader's warnings
     * @throws InputException naming the file, line and field when it cannot be read
     */
    public static PartsList readPartsList(Path partsList) throws InputException {
        try {
            return new PartsListReader().read(partsList);
        } catch (NoSuchFileException e) {
            throw new InputException(partsList + ": no such file", e);
        } catch (IOException e) {
            throw new InputException(partsList + ": cannot be read (" + e.getMessage() + ")", e);
        } catch (RecordFormatException e) {
            throw new InputException(e.getMessage(), e);
        }
    }

    private static void add(Mechanism m, Part p) {
        dev.penduline.model.Part q = NamedElements.addPart(m, p.name());
        q.setMass(tidy(p.mass()));
        q.setCentroidX(tidy(p.centroid().getX()));
        q.setCentroidY(tidy(p.centroid().getY()));
        q.setCentroidZ(tidy(p.centroid().getZ()));
        q.setCutout(p.cutout());
        q.setQuantity(p.quantity());
        q.setMassTolerance(tidy(p.tolerance().mass()));
        q.setDimensionTolerance(tidy(p.tolerance().dimension()));
        if (p.orientation().getAngle() != 0 && !(p.shape() instanceof GivenTensor)) {
            throw new InvalidValueException("part '" + p.name()
                    + "': a rotated standard shape cannot come from a parts list");
        }
        switch (p.shape()) {
            case PointMass s -> q.setShape(ShapeKind.POINT_MASS);
            case SlenderRod s -> {
                q.setShape(ShapeKind.SLENDER_ROD);
                q.setLength(tidy(s.length()));
                q.setShapeAxis(axis(s.axis()));
            }
            case Box s -> {
                q.setShape(ShapeKind.BOX);
                q.setLength(tidy(s.lengthX()));
                q.setWidth(tidy(s.widthY()));
                q.setHeight(tidy(s.heightZ()));
            }
            case Cylinder s -> {
                q.setShape(s.innerRadius() > 0 ? ShapeKind.HOLLOW_CYLINDER : ShapeKind.CYLINDER);
                q.setRadius(tidy(s.radius()));
                q.setInnerRadius(tidy(s.innerRadius()));
                q.setLength(tidy(s.length()));
                q.setShapeAxis(axis(s.axis()));
            }
            case Sphere s -> {
                q.setShape(ShapeKind.SPHERE);
                q.setRadius(tidy(s.radius()));
            }
            case ThinRing s -> {
                q.setShape(ShapeKind.THIN_RING);
                q.setRadius(tidy(s.radius()));
                q.setShapeAxis(axis(s.axis()));
            }
            case GivenTensor s -> {
                // The parts list gives the tensor about the centroid in the mechanism frame;
                // the part's own tensor is scaled to its mass (GivenTensor scales with mass).
                InertiaTensor t = p.centroidalInertia();
                double scale = 1.0 / (p.cutout() ? -p.quantity() : p.quantity());
                q.setShape(ShapeKind.MASS_PROPERTIES);
                q.setTensorReference(TensorReference.CENTROID);
                q.setIxx(tidy(t.xx() * scale));
                q.setIyy(tidy(t.yy() * scale));
                q.setIzz(tidy(t.zz() * scale));
                q.setIxy(tidy(t.xy() * scale));
                q.setIxz(tidy(t.xz() * scale));
                q.setIyz(tidy(t.yz() * scale));
            }
        }
    }

    /**
     * Rounds to 12 significant digits, far below any measurement's precision, so that unit
     * conversion leftovers (0.0065000000000000001 from 6.5 mm) do not reach the file.
     */
    private static double tidy(double v) {
        return v == 0 || !Double.isFinite(v) ? v : new BigDecimal(v).round(TWELVE_DIGITS).doubleValue();
    }

    private static ShapeAxis axis(Axis a) {
        return switch (a) {
            case X -> ShapeAxis.X;
            case Y -> ShapeAxis.Y;
            case Z -> ShapeAxis.Z;
        };
    }
}
