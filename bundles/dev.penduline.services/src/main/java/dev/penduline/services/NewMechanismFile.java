package dev.penduline.services;

import java.nio.file.Path;
import java.util.Optional;

import dev.penduline.model.Mechanism;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.model.naming.StableIds;
import dev.penduline.model.persistence.MechanismFormat;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.records.parts.PartsList;

/**
 * Starts a mechanism file for a new project: empty, or holding the parts of a parts list. The
 * use case behind the workbench's new-project wizard. The parts list is read first, so that a
 * bad list is reported before anything is created; the file is never overwritten.
 */
public final class NewMechanismFile {

    private NewMechanismFile() {
    }

    /**
     * The file name a mechanism of that name gets: its stable identifier with the mechanism
     * file extension ("Inspection hatch IH-60" gives {@code inspection-hatch-ih-60.penduline}).
     *
     * @param mechanismName the mechanism's name
     * @return the file name, without folder
     */
    public static String fileName(String mechanismName) {
        return StableIds.slug(mechanismName, "mechanism") + "." + MechanismFormat.FILE_EXTENSION;
    }


    /**
     * Writes a new mechanism file: with the parts of a list when one is given (see
     * {@link PartsImport#write}), else a mechanism without parts yet.
     *
     * @param name   the mechanism's name
     * @param parts  the parts as read, or empty
     * @param target the mechanism file to create; it must not exist
     * @throws InputException when the target exists or cannot be written
     */
    public static void write(String name, Optional<PartsList> parts, Path target) throws InputException {
        write(name, parts, target, MechanismProperties.STANDARD_GRAVITY);
    }

    /**
     * Writes a new mechanism file for a given local gravity (the user's default,
     * {@link Defaults#gravity()}); otherwise as {@link #write(String, Optional, Path)}.
     *
     * @param name    the mechanism's name
     * @param parts   the parts as read, or empty
     * @param target  the mechanism file to create; it must not exist
     * @param gravity the mechanism's local gravity (m/s²)
     * @throws InputException when the target exists or cannot be written
     */
    public static void write(String name, Optional<PartsList> parts, Path target, double gravity) throws InputException {
        if (parts.isPresent()) {
            PartsImport.write(name, parts.get(), target, gravity, note -> { });
            return;
        }
        Mechanism mechanism = NamedElements.mechanism(name);
        mechanism.setGravity(gravity);
        MechanismStore.createNew(mechanism, target, note -> { });
    }
}
