package dev.penduline.records.parts;

import java.util.List;

import dev.penduline.physics.inertia.Part;

/**
 * A parts list as read from a file.
 *
 * @param source   the file it was read from, as the user named it
 * @param parts    the parts, in file order, all quantities in SI
 * @param warnings things the reader ignored (unknown columns, cells the shape does not use),
 *                 each starting with {@code file:line:}
 */
public record PartsList(String source, List<Part> parts, List<String> warnings) {

    /**
     * Freezes the lists.
     */
    public PartsList {
        parts = List.copyOf(parts);
        warnings = List.copyOf(warnings);
    }
}
