package dev.penduline.services.survey;

/**
 * A record that could not be fitted, with why.
 *
 * @param unit  the unit's key (empty when the record belongs to no unit)
 * @param file  the record (or the unit's records, joined by "; ", when the failure is the whole fit's)
 * @param error what went wrong: the input's message naming file, line and field, or that it is a Penduline bug
 */
public record SurveyFailure(String unit, String file, String error) {
}
