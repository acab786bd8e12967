package dev.penduline.services.survey;

import java.nio.file.Path;
import java.util.List;

/**
 * One unit of a survey: the records of one mechanism built to the design, fitted together (as
 * several sessions of one fit) when there are more than one.
 *
 * @param key   the unit's key (a record's name, or what the grouping gave); units are in key order
 * @param files its records, in name order
 */
public record SurveyUnit(String key, List<Path> files) {

    /** Copies the list. */
    public SurveyUnit {
        files = List.copyOf(files);
        if (files.isEmpty()) {
            throw new IllegalArgumentException("the unit " + key + " has no record");
        }
    }
}
