package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.motion.FrictionTorques;

class MechanismForecastTest {

    /** 2 kg, Lc 0.4 m, J0 0.5 kg·m² in standard gravity: K = 7.84532 N·m/rad. */
    private static final MechanismProperties ARM = MechanismProperties.of(2.0, 0.4, 0.5);

    private static StoredFit viscousFit(double b, double sigma) {
        return new StoredFit("f", "Fit f", FrictionTorques.viscousOnly(b), Double.NaN, List.of("b"), new double[] {b},
                new double[] {sigma}, new double[][] {{1}}, Double.NaN, Double.NaN, java.util.Optional.empty());
    }

    @Test
    void theOvershootBandFollowsTheViscousCoefficientsPercentiles() throws Exception {
        // The overshoot of a lightly damped swing falls monotonically with b, so its 95th percentile
        // over the draws is the overshoot at b's 5th percentile, b (1 − 1.6449 σ/b) (a monotone map
        // keeps quantiles; z(0.95) = 1.6449 from the standard normal table). The overshoot at a
        // given b is the nonlinear swing's; at 2° the linear closed form A e^(−ζπ/√(1−ζ²)) (Ogata,
        // Modern Control Engineering, "maximum overshoot") holds to well within the tolerance.
        double b = 0.2;
        double relSigma = 0.05;
        MechanismSource arm = new MechanismSource("arm", ARM, Optional.empty(), List.of());
        double a0 = Math.toRadians(2);
        MechanismForecast.Outcome o = MechanismForecast.forecast(arm, MechanismForecast.FrictionSource.of(viscousFit(b,
                relSigma * b)), ForecastRequest.fromRest(a0, Math.toRadians(0.2)), 400, 11);
        double k = ARM.gravityStiffness();
        double low = b * (1 - 1.6449 * relSigma);
        double zeta = low / (2 * Math.sqrt(k * ARM.pivotInertia()));
        double expectedHigh = a0 * Math.exp(-zeta * Math.PI / Math.sqrt(1 - zeta * zeta));
        double nominalZeta = b / (2 * Math.sqrt(k * ARM.pivotInertia()));
        double nominal = a0 * Math.exp(-nominalZeta * Math.PI / Math.sqrt(1 - nominalZeta * nominalZeta));
        assertEquals(nominal, o.nominal().maxOvershoot(), 1e-3 * nominal);
        // sampling error of a 5 % quantile from 400 draws: about 0.1 σ of b (order statistics), so 3 standard errors are allowed
        double perSigma = expectedHigh - nominal;
        assertEquals(expectedHigh, o.bands().maxOvershoot().high(), 0.3 * perSigma / 1.6449 + 1e-3 * nominal);
        assertTrue(o.bands().maxOvershoot().low() < nominal && nominal < o.bands().maxOvershoot().high());
        assertEquals(400, o.draws());
        assertTrue(o.bandDefinition().contains("5th and 95th"), o.bandDefinition());
    }

    @Test
    void givenTorquesHaveNoBandsAndSaySo() throws Exception {
        MechanismSource arm = new MechanismSource("arm", ARM, Optional.empty(), List.of());
        MechanismForecast.Outcome o = MechanismForecast.forecast(arm,
                MechanismForecast.FrictionSource.given(FrictionTorques.coulombOnly(0.05), "friction options"),
                ForecastRequest.fromRest(0.3, 0.05), 200, 1);
        assertEquals(0, o.draws());
        assertTrue(Double.isNaN(o.bands().settleTime().low()));
        assertTrue(o.source().description().contains("options"), o.source().description());
        assertTrue(o.nominal().settled());
    }

    @Test
    void theSameSeedGivesTheSameBands() throws Exception {
        MechanismSource arm = new MechanismSource("arm", ARM, Optional.empty(), List.of());
        ForecastRequest r = ForecastRequest.fromRest(0.3, 0.02);
        MechanismForecast.Outcome a = MechanismForecast.forecast(arm, MechanismForecast.FrictionSource.of(viscousFit(0.2,
                0.02)), r, 20, 5);
        MechanismForecast.Outcome b = MechanismForecast.forecast(arm, MechanismForecast.FrictionSource.of(viscousFit(0.2,
                0.02)), r, 20, 5);
        assertEquals(a.bands().settleTime(), b.bands().settleTime());
        assertEquals(a.bands().peakVelocity(), b.bands().peakVelocity());
    }
}
