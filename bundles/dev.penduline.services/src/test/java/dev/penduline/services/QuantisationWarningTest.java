package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.records.swing.SwingImportOptions;

/**
 * The warning about coarse quantisation follows the quantisation theorems' condition (Widrow &amp;
 * Kollár, Quantization Noise, 2008): rounding behaves as additive noise only when the signal's
 * own noise spans about half a step or more.
 */
class QuantisationWarningTest {

    @TempDir
    Path dir;

    private FrictionIdentification.SessionInput record(String name, double noiseDeg) throws Exception {
        MechanismSource arm = MechanismLoader.lumped(2, 0.4, 0.5, 9.80665);
        Path file = dir.resolve(name + ".csv");
        DemoRecords.write(arm, FrictionTorques.viscousOnly(0.01),
                new DemoRecords.Settings(Math.toRadians(20), 0, Math.toRadians(noiseDeg), 4096, 1, 10, 200, 3), file);
        return FrictionIdentification.prepare(file, SwingImportOptions.defaults().withCountsPerRevolution(4096), arm);
    }

    @Test
    void aCoarseEncoderWithLittleNoiseIsFlagged() throws Exception {
        // one count of a 4096-count encoder is 0.088°; 0.005° of noise is far below half a step
        Optional<String> w = FrictionIdentification.quantisationWarning(record("coarse", 0.005));
        assertTrue(w.isPresent());
        assertTrue(w.get().contains("encoder steps of 0.0879°"), w.get());
    }

    @Test
    void enoughNoiseToDitherTheStepsIsNotFlagged() throws Exception {
        // 0.1° of noise spans more than a step: rounding acts as additive noise
        assertFalse(FrictionIdentification.quantisationWarning(record("dithered", 0.1)).isPresent());
    }
}
