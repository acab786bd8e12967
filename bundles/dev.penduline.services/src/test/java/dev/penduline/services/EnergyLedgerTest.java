package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingRun;

class EnergyLedgerTest {

    /** 2 kg, Lc 0.4 m, J0 0.5 kg·m² in standard gravity. */
    private static final MechanismProperties ARM = MechanismProperties.of(2.0, 0.4, 0.5);

    @Test
    void viscousLossAfterEachFullSwingFollowsTheLogarithmicDecrement() throws Exception {
        // Released from rest, the linear viscously damped oscillator turns at t = k·Td/2 exactly
        // (ω ∝ e^(−ζωn t) sin(ωd t)), and its amplitude falls by e^(−δ) each damped period Td with
        // the logarithmic decrement δ = 2πζ/√(1 − ζ²) (Thomson, Theory of Vibration with
        // Applications, "logarithmic decrement"; from memory). At those instants all the energy is
        // potential, so after n periods the viscous term has taken E0·(1 − e^(−2nδ)). At 2° the
        // pendulum's nonlinearity moves this by about θ0²/12 ≈ 1e-4 of E0.
        double k = ARM.gravityStiffness();
        double wn = ARM.naturalFrequency();
        double zeta = 0.04;
        double b = 2 * zeta * ARM.pivotInertia() * wn;
        double td = 2 * Math.PI / (wn * Math.sqrt(1 - zeta * zeta));
        double theta0 = Math.toRadians(2);
        FrictionTorques viscous = FrictionTorques.viscousOnly(b);
        MechanismSource arm = new MechanismSource("arm", ARM, Optional.empty(), List.of());
        SwingRun run = SwingPrediction.simulate(arm, viscous, theta0, 0, 6 * td, 256 / td);
        EnergyLedger ledger = EnergyLedger.of(ARM, viscous, run);
        double e0 = ledger.kinetic()[0] + ledger.potential()[0];
        assertEquals(0.5 * k * theta0 * theta0, e0, 2e-4 * e0, "released from rest: E0 = ½·K·θ0² to θ0²/12");
        double delta = 2 * Math.PI * zeta / Math.sqrt(1 - zeta * zeta);
        for (int n = 1; n <= 6; n++) {
            int i = 256 * n;
            double expected = e0 * (1 - Math.exp(-2 * n * delta));
            assertEquals(expected, ledger.viscous()[i], 2e-3 * expected, "dissipated after " + n + " periods");
            assertEquals(0, ledger.coulomb()[i], 0.0, "no Coulomb term, no Coulomb loss");
        }
    }

    @Test
    void everyJouleIsAccountedForAndTheTotalsAreTheSimulatorsOwn() throws Exception {
        // Conservation of energy: kinetic + potential + dissipated stays the released energy; the
        // totals summed here agree with the ones the simulator integrates with the motion.
        FrictionTorques mixed = new FrictionTorques(0.05, 0.02, 0.03, 0.01);
        MechanismSource arm = new MechanismSource("arm", ARM, Optional.empty(), List.of());
        SwingRun run = SwingPrediction.simulate(arm, mixed, Math.toRadians(40), 0, 20, 500);
        EnergyLedger ledger = EnergyLedger.of(ARM, mixed, run);
        double e0 = run.energy().initial();
        for (int i = 0; i < ledger.size(); i += 97) {
            double sum = ledger.kinetic()[i] + ledger.potential()[i] + ledger.viscous()[i] + ledger.coulomb()[i]
                    + ledger.drag()[i];
            assertEquals(e0, sum, 1e-3 * e0, "balance at " + ledger.times()[i] + " s");
        }
        int last = ledger.size() - 1;
        assertEquals(run.energy().viscous(), ledger.viscous()[last], 2e-3 * e0);
        assertEquals(run.energy().coulomb(), ledger.coulomb()[last], 2e-3 * e0);
        assertEquals(run.energy().drag(), ledger.drag()[last], 2e-3 * e0);
    }
}
