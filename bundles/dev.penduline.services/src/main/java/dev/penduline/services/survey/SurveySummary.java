package dev.penduline.services.survey;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.population.PopulationStatistics;
import dev.penduline.services.FitWording;

/**
 * The population's statistics over the fitted units, per term present in any unit (in the order
 * viscous, coulomb, stiction, drag) and for the fitted pivot inertia ({@value #PIVOT_INERTIA}),
 * with the units that stand out.
 *
 * @param terms        each quantity's statistics, over the units that have it, in unit order
 * @param units        for each quantity, the keys of the units its values belong to, in order
 * @param values       for each quantity, the values, in unit order (SI)
 * @param outliers     units whose modified z-score exceeds {@link PopulationStatistics#OUTLIER_SCORE}
 * @param beyondLimits units above the UCL or below the LCL of the individuals chart
 */
public record SurveySummary(Map<String, PopulationStatistics> terms, Map<String, List<String>> units,
        Map<String, double[]> values, List<Flagged> outliers, List<Flagged> beyondLimits) {

    /** The name of the fitted pivot inertia J0 among the terms. */
    public static final String PIVOT_INERTIA = "pivot_inertia";

    /**
     * A unit that stands out in one quantity.
     *
     * @param unit  the unit's key
     * @param term  the quantity
     * @param value its value (SI)
     * @param score its modified z-score (NaN for a unit beyond the control limits, where it is not the criterion)
     */
    public record Flagged(String unit, String term, double value, double score) {
    }

    /** Copies the collections. */
    public SurveySummary {
        terms = Collections.unmodifiableMap(new LinkedHashMap<>(terms));
        units = Collections.unmodifiableMap(new LinkedHashMap<>(units));
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
        outliers = List.copyOf(outliers);
        beyondLimits = List.copyOf(beyondLimits);
    }

    /**
     * The statistics of the fitted rows.
     *
     * @param rows the survey's rows, in unit order (failed ones are left out)
     * @return the summary
     */
    public static SurveySummary of(List<SurveyRow> rows) {
        List<SurveyRow> fitted = rows.stream().filter(SurveyRow::fitted).toList();
        List<String> names = new ArrayList<>();
        for (FrictionTerm t : FrictionTerm.values()) {
            String w = FitWording.word(t);
            if (fitted.stream().anyMatch(r -> r.estimate(w).isPresent())) {
                names.add(w);
            }
        }
        if (!fitted.isEmpty()) {
            names.add(PIVOT_INERTIA);
        }
        Map<String, PopulationStatistics> stats = new LinkedHashMap<>();
        Map<String, List<String>> keys = new LinkedHashMap<>();
        Map<String, double[]> values = new LinkedHashMap<>();
        List<Flagged> outliers = new ArrayList<>();
        List<Flagged> beyond = new ArrayList<>();
        for (String name : names) {
            List<String> k = new ArrayList<>();
            List<Double> v = new ArrayList<>();
            for (SurveyRow r : fitted) {
                double x = name.equals(PIVOT_INERTIA) ? r.inertia() : r.estimate(name).map(SurveyRow.Estimate::value)
                        .orElse(Double.NaN);
                if (Double.isFinite(x)) {
                    k.add(r.key());
                    v.add(x);
                }
            }
            if (v.isEmpty()) {
                continue;
            }
            double[] x = v.stream().mapToDouble(Double::doubleValue).toArray();
            PopulationStatistics s = PopulationStatistics.of(x);
            stats.put(name, s);
            keys.put(name, k);
            values.put(name, x);
            for (int i : s.outliers()) {
                outliers.add(new Flagged(k.get(i), name, x[i], s.scores()[i]));
            }
            for (int i : s.beyondLimits()) {
                beyond.add(new Flagged(k.get(i), name, x[i], Double.NaN));
            }
        }
        return new SurveySummary(stats, keys, values, outliers, beyond);
    }
}
