package dev.penduline.physics.swing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;

class PeriodCheckTest {

    private static final MechanismProperties ARM = SyntheticSwingRecord.ARM;

    private static SwingAnalysis analyse(MechanismProperties assumed, double theta0) {
        final double[][] s = new SyntheticSwingRecord(ARM, FrictionTorques.none(), theta0, 1.0, 12, 400,
                Math.toRadians(0.01), 0, 3, 0).samples();
        return new SwingAnalyzer().withMechanism(assumed).analyse(s[0], s[1]);
    }

    @Test
    void largeAmplitudePeriodFollowsTheClassicSeries() {
        final double theta0 = Math.toRadians(40);
        final SwingAnalysis a = analyse(ARM, theta0);
        final SwingCycle c = a.cycles().get(2);
        // T/T0 = 1 + θ0²/16 + 11 θ0⁴/3072 + 173 θ0⁶/737280 + … (the series of 2K(sin(θ0/2))/π; e.g. Nelson &
        // Olsson, Am. J. Phys. 54 (1986) 112, eq. 13), independent of the elliptic-integral code
        final double x = c.amplitude();
        final double series = 1 + x * x / 16 + 11 * Math.pow(x, 4) / 3072 + 173 * Math.pow(x, 6) / 737280;
        assertEquals(series, c.period() / ARM.smallAnglePeriod(), 2e-4);
        assertEquals(0, c.relativeDifference(), 2e-4);
        assertEquals(ARM.smallAnglePeriod(), a.periodCheck().measuredSmallAnglePeriod(), 2e-4 * ARM.smallAnglePeriod());
        assertTrue(a.warnings().isEmpty(), a.warnings().toString());
    }

    @Test
    void aWrongInertiaShowsBeforeAnyFit() {
        // the analysis is told J0 is 10 % too large; T ∝ sqrt(J0) (compound-pendulum period T0 = 2π sqrt(J0 / (m g Lc)), any dynamics text)
        final SwingAnalysis a = analyse(ARM.withPivotInertia(1.1 * ARM.pivotInertia()), Math.toRadians(15));
        assertEquals(Math.sqrt(1 / 1.1) - 1, a.periodCheck().medianRelativeDifference(), 3e-4);
        assertEquals(ARM.pivotInertia(), a.periodCheck().impliedPivotInertia(), 1e-3 * ARM.pivotInertia());
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("inertia")), a.warnings().toString());
    }

    @Test
    void withoutMechanismThereAreNoEstimatesButAMeasuredPeriod() {
        final double[][] s = SyntheticSwingRecord.of(FrictionTorques.viscousOnly(0.04), Math.toRadians(20)).samples();
        final SwingAnalysis a = new SwingAnalyzer().analyse(s[0], s[1]);
        assertTrue(a.estimates().isEmpty());
        assertTrue(Double.isNaN(a.periodCheck().predictedSmallAnglePeriod()));
        // compound-pendulum period T0 = 2π sqrt(J0 / (m g Lc)) of the simulated arm
        assertEquals(ARM.smallAnglePeriod(), a.periodCheck().measuredSmallAnglePeriod(), 2e-3 * ARM.smallAnglePeriod());
    }
}
