package dev.penduline.services;

import java.nio.file.Path;
import java.util.List;

import dev.penduline.model.Mechanism;
import dev.penduline.model.persistence.MechanismFileException;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.model.validation.MechanismValidation;

/** Saves a changed mechanism: validated first, then written atomically. */
public final class MechanismStore {

    private MechanismStore() {
    }

    /**
     * Validates a mechanism before it is saved.
     *
     * @param mechanism the mechanism
     * @param file      where it would be saved (for the message)
     * @throws InputException listing every error
     */
    public static void check(Mechanism mechanism, Path file) throws InputException {
        List<String> errors = MechanismValidation.errors(mechanism);
        if (!errors.isEmpty()) {
            throw new InputException(file + ": not saved, " + errors.size() + " problem(s):\n  "
                    + String.join("\n  ", errors));
        }
    }

    /**
     * Validates and saves a mechanism; nothing is written when it has errors.
     *
     * @param mechanism the mechanism
     * @param file      where to save it
     * @throws InputException listing every error, or naming the file when writing fails
     */
    public static void save(Mechanism mechanism, Path file) throws InputException {
        check(mechanism, file);
        try {
            MechanismFiles.save(mechanism, file);
        } catch (MechanismFileException e) {
            throw new InputException(e.getMessage(), e);
        }
    }
}
