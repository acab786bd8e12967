package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.swing.SwingImportOptions;

/** The fitted model beside a record: what the Friction Fit wizard plots over the residuals. */
class FitCurvesTest {

    @Test
    void theResidualsOfTheFittedModelAreTheRecordsNoise(@TempDir Path dir) throws Exception {
        // INVENTED truth: a lumped pendulum (2 kg, Lc 0.4 m, J0 0.5 kg·m², g 9.81), viscous 0.01
        // N·m·s/rad and Coulomb 0.03 N·m, released at 25° and recorded 12 s at 200 Hz in degrees with
        // Gaussian noise of 0.05° (standard deviation): the residuals of a fit of the right terms are
        // that noise, so their rms must come out near 0.05° (the noise the record was made with).
        MechanismSource m = MechanismLoader.lumped(2, 0.4, 0.5, 9.81);
        double noise = Unit.DEGREE.toSi(0.05);
        Path record = dir.resolve("invented.csv");
        DemoRecords.write(m, new FrictionTorques(0.01, 0.03, 0, 0), new DemoRecords.Settings(Unit.DEGREE.toSi(25),
                Unit.DEGREE.toSi(0.5), noise, 0, 0.5, 12, 200, 7), record);
        FrictionIdentification.SessionInput input = FrictionIdentification.prepare(record, SwingImportOptions.defaults(), m);
        FitSettings d = FitSettings.defaults();
        FrictionIdentification.Outcome outcome = FrictionIdentification.identify(m, List.of(input),
                Optional.of(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB)), true,
                d.withResampling(0, d.seed(), d.parallel()), FitControl.none());
        List<FitCurves.Curve> curves = FitCurves.of(outcome);
        assertEquals(1, curves.size());
        FitCurves.Curve c = curves.get(0);
        assertEquals(input.record().size(), c.times().length, "every sample of the record");
        double sum = 0;
        int n = 0;
        for (int i = 0; i < c.times().length; i++) {
            assertEquals(c.measured()[i] - c.modelled()[i], c.residuals()[i], 1e-15);
            if (c.times()[i] > 1) {
                sum += c.residuals()[i] * c.residuals()[i];
                n++;
            }
        }
        double rms = Math.sqrt(sum / n);
        // n = 2200 samples after the first second: the rms of n normal deviates has a relative
        // standard error of 1/√(2n) = 1.5 % (the chi distribution at large n), the two fitted
        // terms take away a further 2/n: within 4 standard errors, 6 %
        assertEquals(noise, rms, 0.06 * noise, "residual rms against the invented noise");
        // the fit's own rms is over the samples it fitted: another rms of mostly the same
        // residuals, each within 1.5 % of the noise: within 5 % of it
        assertTrue(Math.abs(rms - outcome.fit().sessions().get(0).rms()) < 0.05 * noise,
                "the fit's own rms for the session: " + outcome.fit().sessions().get(0).rms());
    }
}
