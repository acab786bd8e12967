package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import dev.penduline.model.Estimate;
import dev.penduline.model.FitResult;
import dev.penduline.model.Mechanism;
import dev.penduline.model.PendulineFactory;
import dev.penduline.model.Setting;

class StoredFitTest {

    private static final PendulineFactory F = PendulineFactory.eINSTANCE;

    private static void estimate(FitResult r, String name, double value, double jacobian, double resampling) {
        Estimate e = F.createEstimate();
        e.setParameter(name);
        e.setValue(value);
        e.setStandardError(jacobian);
        if (resampling > 0) {
            e.setResamplingError(resampling);
        }
        r.getEstimates().add(e);
    }

    private static void setting(FitResult r, String key, String value) {
        Setting s = F.createSetting();
        s.setKey(key);
        s.setValue(value);
        r.getSettings().add(s);
    }

    static FitResult fit(String id) {
        FitResult r = F.createFitResult();
        r.setId(id);
        r.setName("Fit " + id);
        estimate(r, "b", 0.02, 0.001, 0.003);
        estimate(r, "Tc", 0.05, 0.004, 0);
        estimate(r, "J0", 0.61, 0.01, 0);
        // the stored table covers nuisance parameters too, in another order
        r.getCorrelationParameters().addAll(List.of("Tc", "theta0[s]", "b", "J0"));
        double[][] table = {{1, 0.1, -0.6, 0.2}, {0.1, 1, 0.05, 0}, {-0.6, 0.05, 1, 0.3}, {0.2, 0, 0.3, 1}};
        for (double[] row : table) {
            for (double v : row) {
                r.getCorrelations().add(v);
            }
        }
        setting(r, "inertia", "free");
        setting(r, "stop-band", "0.06..0.09");
        return r;
    }

    @Test
    void readsTheTorquesUncertaintiesAndTheCorrelationsOfThePhysicalEstimates() throws Exception {
        StoredFit s = StoredFit.of(fit("a"));
        assertEquals(List.of("b", "Tc", "J0"), s.parameters());
        assertEquals(0.02, s.friction().viscous(), 0);
        assertEquals(0.05, s.friction().coulomb(), 0);
        assertEquals(0.075, s.friction().staticTorque(), 1e-15, "the middle of the stops' band");
        assertEquals(0.61, s.fittedInertia(), 0);
        assertEquals(0.003, s.sigmas()[0], 0, "the larger of the two uncertainties");
        assertEquals(0.004, s.sigmas()[1], 0);
        assertEquals(-0.6, s.correlation()[0][1], 0);
        assertEquals(-0.6, s.correlation()[1][0], 0);
        assertEquals(0.3, s.correlation()[0][2], 0);
        assertEquals(0.2, s.correlation()[1][2], 0);
        assertEquals(1, s.correlation()[2][2], 0);
        assertEquals(0.06, s.stictionLower(), 0);
        assertEquals(0.09, s.stictionUpper(), 0);
    }

    @Test
    void aFitWithFixedInertiaHasNoFittedInertiaAndTheLatestIsTheLast() throws Exception {
        Mechanism m = F.createMechanism();
        FitResult first = fit("first");
        FitResult last = fit("last");
        last.getSettings().get(0).setValue("fixed");
        m.getFitResults().add(first);
        m.getFitResults().add(last);
        StoredFit latest = StoredFit.latest(m).orElseThrow();
        assertEquals("last", latest.id());
        assertTrue(Double.isNaN(latest.fittedInertia()));
        assertEquals("first", StoredFit.byId(m, "first").id());
        InputException e = assertThrows(InputException.class, () -> StoredFit.byId(m, "none"));
        assertTrue(e.getMessage().contains("first, last"), e.getMessage());
        assertTrue(StoredFit.latest(F.createMechanism()).isEmpty());
    }

    @Test
    void aDrawnSetBecomesTorquesWithNegativeTermsCutAndJ0OnlyWhenFitted() throws Exception {
        StoredFit s = StoredFit.of(fit("a"));
        double[] set = {-0.001, 0.04, 0.63};
        assertTrue(s.cutsFriction(set));
        assertEquals(0, s.frictionOf(set, 0).viscous(), 0);
        assertEquals(0.04, s.frictionOf(set, 0).coulomb(), 0);
        assertEquals(0.04, s.frictionOf(set, 0).staticTorque(), 0, "the static torque is at least the Coulomb torque");
        assertEquals(0.07, s.frictionOf(set, 0.07).staticTorque(), 0);
        assertEquals(0.63, s.inertiaOf(set, 0.5), 0);
        FitResult fixed = fit("b");
        fixed.getSettings().get(0).setValue("fixed");
        assertEquals(0.5, StoredFit.of(fixed).inertiaOf(set, 0.5), 0, "a fixed-inertia fit keeps the calculated J0");
        assertTrue(s.hasUncertainty());
    }
}
