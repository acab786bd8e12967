package dev.penduline.physics.identify;

/**
 * The pivot inertia as calculated from the parts list and as fitted to the records.
 *
 * @param calculated        J0 from the mechanism (kg·m²)
 * @param fitted            J0 from the fit, equal to calculated when held fixed (kg·m²)
 * @param sigma             standard error of the fitted J0 (kg·m²), NaN when fixed
 * @param differencePercent (fitted − calculated) / calculated × 100 (%)
 * @param free              whether J0 was fitted
 */
public record InertiaCheck(double calculated, double fitted, double sigma, double differencePercent,
        boolean free) {
}
