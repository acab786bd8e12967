package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.forecast.Forecaster;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingSimulator;

class SpecDesignTest {

    /** 2 kg, Lc 0.4 m, J0 0.5 kg·m² in standard gravity: K = 7.84532 N·m/rad, ωn = 3.961 rad/s. */
    private static final MechanismProperties ARM = MechanismProperties.of(2.0, 0.4, 0.5);
    private static final FrictionTorques LIGHT = FrictionTorques.viscousOnly(0.01);

    private static SwingForecast forecast(FrictionTorques f, ForecastRequest r) {
        return new Forecaster(new SwingSimulator(ARM, f)).forecast(r);
    }

    @Test
    void theViscousDampingFoundForASettleTimeMeetsItWhenReSimulatedAndLessDoesNot() {
        ForecastRequest r = ForecastRequest.fromRest(0.3, 0.01);
        double within = 8;
        SpecDesign.Answer a = SpecDesign.design(ARM, LIGHT, r, SpecDesign.Spec.settleWithin(within), SpecDesign.Term.VISCOUS);
        assertTrue(a.meets(), a.reason());
        assertTrue(a.added() > 0);
        assertEquals(0.01 + a.added(), a.total(), 1e-15);
        // re-simulated independently of the design: with the found damping it settles in time ...
        SwingForecast with = forecast(FrictionTorques.viscousOnly(a.total()), r);
        assertTrue(with.settled() && with.settleTime() <= within, "settles after " + with.settleTime());
        // ... and with 2 % less it does not (the answer is the smallest that meets the spec)
        SwingForecast less = forecast(FrictionTorques.viscousOnly(0.01 + 0.98 * a.added()), r);
        assertTrue(!less.settled() || less.settleTime() > within, "settles after " + less.settleTime());
        // the envelope estimate ζ ≈ ln(A/B)/(ωn T) of a lightly damped swing (common practice) is
        // within a half-period's worth of it: the swing's peaks, where it is judged settled, come
        // every π/ωn, so the last peak before T may be that much earlier, and ζ larger by up to
        // π/(ωn T − π) of itself (11 % here)
        double zeta = Math.log(0.3 / 0.01) / (ARM.naturalFrequency() * within);
        double estimate = 2 * zeta * Math.sqrt(ARM.gravityStiffness() * ARM.pivotInertia());
        double halfPeriod = Math.PI / ARM.naturalFrequency();
        assertEquals(estimate, a.total(), halfPeriod / (within - halfPeriod) * estimate);
    }

    @Test
    void theDryFrictionFoundForASpeedLimitMeetsItWhenReSimulated() {
        double at = 0;
        double limit = 1.0;
        ForecastRequest r = ForecastRequest.fromRest(0.8, 0.01);
        SpecDesign.Answer a = SpecDesign.design(ARM, LIGHT, r, SpecDesign.Spec.maxSpeedAt(at, limit), SpecDesign.Term.COULOMB);
        assertTrue(a.meets(), a.reason());
        ForecastRequest passing = new ForecastRequest(0.8, 0, 0.01, at, Double.NaN);
        FrictionTorques found = new FrictionTorques(0.01, a.added(), a.added(), 0);
        double speed = Math.abs(forecast(found, passing).pass().orElseThrow().angularVelocity());
        assertTrue(speed <= limit + 1e-9, "speed " + speed);
        assertEquals(limit, speed, 1e-4, "the smallest torque that meets the limit brings the speed to it");
        // the undamped speed at the bottom, from the energy balance sqrt(2K(1 − cos x0)/J0), is above
        // the limit, so something had to be added
        assertTrue(Math.sqrt(2 * ARM.gravityStiffness() * (1 - Math.cos(0.8)) / ARM.pivotInertia()) > limit);
        assertTrue(a.baseline() > limit);
    }

    @Test
    void aSpecNoAmountCanMeetIsSaidSoWithTheReason() {
        // settling within a tenth of a period from 0.3 rad into ±0.01 rad: not even critical damping does it
        ForecastRequest r = ForecastRequest.fromRest(0.3, 0.01);
        SpecDesign.Answer a = SpecDesign.design(ARM, LIGHT, r, SpecDesign.Spec.settleWithin(0.15), SpecDesign.Term.VISCOUS);
        assertFalse(a.meets());
        assertTrue(Double.isNaN(a.added()));
        assertTrue(a.reason().contains("critical damping"), a.reason());
        // dry friction cannot bring it inside a band narrower than the rest band it creates
        SpecDesign.Answer dry = SpecDesign.design(ARM, LIGHT, r, SpecDesign.Spec.settleWithin(0.15), SpecDesign.Term.COULOMB);
        assertFalse(dry.meets());
        assertTrue(dry.reason().contains("outside the band"), dry.reason());
    }

    @Test
    void aMechanismThatMeetsTheSpecNeedsNothingAdded() {
        SpecDesign.Answer a = SpecDesign.design(ARM, FrictionTorques.viscousOnly(0.5), ForecastRequest.fromRest(0.3, 0.05),
                SpecDesign.Spec.settleWithin(100), SpecDesign.Term.VISCOUS);
        assertTrue(a.meets());
        assertEquals(0, a.added(), 0);
    }
}
