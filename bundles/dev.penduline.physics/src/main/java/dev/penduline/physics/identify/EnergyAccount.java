package dev.penduline.physics.identify;

import java.util.List;

import dev.penduline.physics.MechanismProperties;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingEnergy;
import dev.penduline.physics.motion.SwingSimulator;

/**
 * The energy each loss dissipated over the recorded swings at the fitted parameters, from the
 * simulator's energy account (each dissipation integral is carried in its state, so the shares
 * are as accurate as the motion).
 */
final class EnergyAccount {

    private EnergyAccount() {
    }

    static EnergyShares of(MechanismProperties level, FrictionTorques friction, double[] full,
            List<ReleaseSession> sessions, double tolerance) {
        final SwingSimulator simulator = new SwingSimulator(
                level.withPivotInertia(full[ParameterLayout.index(ParameterKind.INERTIA)]), friction)
                .withTolerance(tolerance);
        double viscous = 0;
        double coulomb = 0;
        double drag = 0;
        for (int s = 0; s < sessions.size(); s++) {
            final double[] t = sessions.get(s).timesView();
            final double span = t[t.length - 1] - full[ParameterLayout.index(s, ParameterKind.RELEASE_TIME)];
            if (span > 0) {
                final SwingEnergy e = simulator.simulate(full[ParameterLayout.index(s, ParameterKind.RELEASE_ANGLE)], 0,
                        new double[] {0, span}).energy();
                viscous += e.viscous();
                coulomb += e.coulomb();
                drag += e.drag();
            }
        }
        final double total = viscous + coulomb + drag;
        if (!(total > 0)) {
            return new EnergyShares(0, 0, 0, 0, null);
        }
        FrictionTerm dominant = FrictionTerm.VISCOUS;
        double largest = viscous;
        if (coulomb > largest) {
            dominant = FrictionTerm.COULOMB;
            largest = coulomb;
        }
        if (drag > largest) {
            dominant = FrictionTerm.DRAG;
        }
        return new EnergyShares(viscous / total, coulomb / total, drag / total, total, dominant);
    }
}
