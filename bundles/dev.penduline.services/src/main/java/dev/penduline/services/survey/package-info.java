/**
 * The survey of a production line: many records of one mechanism design, fitted unit by unit
 * ({@code penduline survey}). {@link dev.penduline.services.survey.SurveyGrouping} turns folders,
 * files or a manifest into {@link dev.penduline.services.survey.SurveyUnit units};
 * {@link dev.penduline.services.survey.SurveyRun} fits them in parallel, each fit single-threaded,
 * writes each {@link dev.penduline.services.survey.SurveyRow row} to the
 * {@link dev.penduline.services.survey.SurveyJournal journal} as it completes and reuses the rows
 * of an earlier run with the same records and settings;
 * {@link dev.penduline.services.survey.SurveySummary} gives the population's statistics
 * ({@link dev.penduline.physics.population.PopulationStatistics}) per term.
 */
package dev.penduline.services.survey;
