package dev.penduline.services;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import dev.penduline.model.Estimate;
import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Setting;
import dev.penduline.physics.motion.FrictionTorques;

/**
 * A friction fit stored in a mechanism file, read back into SI values for predictions: the
 * friction torques, the fitted pivot inertia when the fit freed it, the physical estimates with
 * their standard uncertainties and correlations, and the static-friction band of the stops.
 *
 * @param id            the stored fit's identifier
 * @param name          its name (says when it was computed)
 * @param friction      the fitted torques (terms not fitted are zero; Ts = Tc when the fit gave no
 *                      band of static torque)
 * @param fittedInertia the fitted J0 (kg·m²) when the fit freed the inertia, else NaN
 * @param parameters    the physical estimates' names (b, Tc, c, J0), in the order of the arrays
 * @param values        their values (SI)
 * @param sigmas        their standard uncertainties: the larger of the Jacobian and the
 *                      resampling estimate (SI), 0 when neither was stored
 * @param correlation   their correlations (identity where none was stored)
 * @param stictionLower lower end of the static torque band of the stops (N·m), or NaN
 * @param stictionUpper upper end of that band (N·m), or NaN
 * @param stale         why the fit is stale (its parts changed since), or empty
 */
public record StoredFit(String id, String name, FrictionTorques friction, double fittedInertia, List<String> parameters,
        double[] values, double[] sigmas, double[][] correlation, double stictionLower, double stictionUpper,
        Optional<String> stale) {

    /** Copies the list so the record stays immutable. */
    public StoredFit {
        parameters = List.copyOf(parameters);
    }

    /**
     * Whether any estimate carries an uncertainty, so that parameter sets can be drawn.
     *
     * @return true when a standard uncertainty is above zero
     */
    public boolean hasUncertainty() {
        for (double s : sigmas) {
            if (s > 0) {
                return true;
            }
        }
        return false;
    }

    /**
     * The torques of a parameter set drawn in the order of {@link #parameters()}: terms not
     * drawn keep the fit's value, negative draws are cut to zero.
     *
     * @param set          the drawn values
     * @param staticTorque the static torque to use (raised to the Coulomb torque when below it)
     * @return the torques
     */
    public FrictionTorques frictionOf(double[] set, double staticTorque) {
        double b = friction.viscous();
        double tc = friction.coulomb();
        double c = friction.drag();
        for (int i = 0; i < set.length; i++) {
            switch (parameters.get(i)) {
                case "b" -> b = Math.max(0, set[i]);
                case "Tc" -> tc = Math.max(0, set[i]);
                case "c" -> c = Math.max(0, set[i]);
                default -> {
                    // J0 is read by inertiaOf
                }
            }
        }
        return new FrictionTorques(b, tc, Math.max(staticTorque, tc), c);
    }

    /**
     * Whether a drawn set has a friction term below zero (cut to zero by {@link #frictionOf}).
     *
     * @param set the drawn values
     * @return true when b, Tc or c came out negative
     */
    public boolean cutsFriction(double[] set) {
        for (int i = 0; i < set.length; i++) {
            if (!"J0".equals(parameters.get(i)) && set[i] < 0) {
                return true;
            }
        }
        return false;
    }

    /**
     * The pivot inertia of a drawn set: its J0 when the fit freed the inertia, else the fallback.
     *
     * @param set      the drawn values
     * @param fallback the J0 to use otherwise (kg·m²)
     * @return J0 (kg·m²), not yet limited to m·Lc²
     */
    public double inertiaOf(double[] set, double fallback) {
        int i = parameters.indexOf("J0");
        return i >= 0 && Double.isFinite(fittedInertia) ? set[i] : fallback;
    }

    /**
     * The most recently stored fit of a mechanism (the last in the file).
     *
     * @param mechanism the mechanism
     * @return the fit, or empty when none is stored
     * @throws InputException when the stored fit cannot be read back
     */
    public static Optional<StoredFit> latest(Mechanism mechanism) throws InputException {
        List<FitResult> fits = mechanism.getFitResults();
        return fits.isEmpty() ? Optional.empty() : Optional.of(of(fits.get(fits.size() - 1)));
    }

    /**
     * A stored fit by its identifier.
     *
     * @param mechanism the mechanism
     * @param id        the identifier
     * @return the fit
     * @throws InputException naming the identifiers there are when none matches
     */
    public static StoredFit byId(Mechanism mechanism, String id) throws InputException {
        List<String> ids = new ArrayList<>();
        for (FitResult r : mechanism.getFitResults()) {
            if (r.getId().equals(id)) {
                return of(r);
            }
            ids.add(r.getId());
        }
        throw new InputException("no stored fit '" + id + "'; " + (ids.isEmpty() ? "the file holds none"
                : "the stored fits are: " + String.join(", ", ids)));
    }

    /**
     * Reads a stored fit.
     *
     * @param r the stored result
     * @return the fit in SI values
     * @throws InputException when an estimate is not a finite number
     */
    public static StoredFit of(FitResult r) throws InputException {
        List<String> names = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        List<Double> sigmas = new ArrayList<>();
        double b = 0;
        double tc = 0;
        double c = 0;
        double j0 = Double.NaN;
        for (Estimate e : r.getEstimates()) {
            String p = e.getParameter();
            double v = e.getValue();
            if (!Double.isFinite(v)) {
                throw new InputException("stored fit " + r.getId() + ": estimate " + p + " is " + v
                        + ", not a number a prediction can use; fit again");
            }
            switch (p) {
                case "b" -> b = Math.max(0, v);
                case "Tc" -> tc = Math.max(0, v);
                case "c" -> c = Math.max(0, v);
                case "J0" -> j0 = v;
                default -> {
                    continue;
                }
            }
            names.add(p);
            values.add(v);
            double s = Math.max(e.isSetStandardError() ? e.getStandardError() : 0,
                    e.isSetResamplingError() ? e.getResamplingError() : 0);
            sigmas.add(Double.isFinite(s) && s > 0 ? s : 0);
        }
        if (!setting(r, "inertia").filter("free"::equals).isPresent()) {
            j0 = Double.NaN;
        }
        double[] band = stictionBand(setting(r, "stop-band").orElse(null));
        double ts = Double.isFinite(band[0]) ? Math.max(tc, 0.5 * (band[0] + band[1])) : tc;
        return new StoredFit(r.getId(), r.getName(), new FrictionTorques(b, tc, ts, c), j0, names,
                values.stream().mapToDouble(Double::doubleValue).toArray(),
                sigmas.stream().mapToDouble(Double::doubleValue).toArray(), correlation(r, names), band[0], band[1],
                setting(r, PartsImport.STALE));
    }

    /**
     * A setting stored with a fit.
     *
     * @param r   the stored result
     * @param key the setting's key ("integration-tolerance", "inertia", ...)
     * @return its value, empty when the fit has none of that key
     */
    public static Optional<String> setting(FitResult r, String key) {
        for (Setting s : r.getSettings()) {
            if (key.equals(s.getKey())) {
                return Optional.ofNullable(s.getValue());
            }
        }
        return Optional.empty();
    }

    private static double[] stictionBand(String text) {
        if (text != null) {
            String[] ends = text.split("\\.\\.", 2);
            if (ends.length == 2) {
                try {
                    double lo = Double.parseDouble(ends[0].trim());
                    double hi = Double.parseDouble(ends[1].trim());
                    if (Double.isFinite(lo) && Double.isFinite(hi) && lo >= 0 && hi >= lo) {
                        return new double[] {lo, hi};
                    }
                } catch (NumberFormatException e) {
                    // an unreadable band is no band
                }
            }
        }
        return new double[] {Double.NaN, Double.NaN};
    }

    /** The correlations among the named estimates, from the stored square table over all parameters. */
    private static double[][] correlation(FitResult r, List<String> names) {
        int k = names.size();
        double[][] out = new double[k][k];
        for (int i = 0; i < k; i++) {
            out[i][i] = 1;
        }
        List<String> all = r.getCorrelationParameters();
        int n = all.size();
        if (n == 0 || r.getCorrelations().size() != n * n) {
            return out;
        }
        for (int i = 0; i < k; i++) {
            int a = all.indexOf(names.get(i));
            for (int j = 0; j < k; j++) {
                int bIndex = all.indexOf(names.get(j));
                if (i != j && a >= 0 && bIndex >= 0) {
                    double v = r.getCorrelations().get(a * n + bIndex);
                    out[i][j] = Double.isFinite(v) ? Math.max(-1, Math.min(1, v)) : 0;
                }
            }
        }
        // the table is stored symmetric to rounding; use one triangle for both
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < i; j++) {
                out[i][j] = out[j][i];
            }
        }
        return out;
    }
}
