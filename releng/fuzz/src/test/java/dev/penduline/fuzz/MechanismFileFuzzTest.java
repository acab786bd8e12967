package dev.penduline.fuzz;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Timeout;

import com.code_intelligence.jazzer.junit.FuzzTest;

import dev.penduline.model.Mechanism;
import dev.penduline.model.adapt.MechanismAdapter;
import dev.penduline.model.persistence.MechanismFileException;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.model.validation.MechanismValidation;

/**
 * Fuzzes {@link MechanismFiles#load(Path)} (EMF XMI with DTDs and entities refused) with
 * arbitrary bytes as the file's content, and what every caller does next with a loaded file.
 *
 * <p>Each input must either load or raise a {@link MechanismFileException} whose message names
 * the file and passes {@link InputChecks}; anything else, an error or a hang is a finding. A
 * mechanism that loads is validated as the command line and the workbench do: validation must
 * not throw and its messages pass {@link InputChecks}; when it finds no error, turning the
 * mechanism into the inertia engine's frame and parts may refuse only with an
 * {@link IllegalArgumentException} (which the callers report) whose message passes them too.
 */
@Timeout(value = 10, unit = TimeUnit.SECONDS)
class MechanismFileFuzzTest {

    private static final Path FILE = InputChecks.scratch("mechanism.penduline");

    @FuzzTest
    void mechanismFile(byte[] input) {
        InputChecks.write(FILE, input);
        final Mechanism mechanism;
        try {
            mechanism = MechanismFiles.load(FILE);
        } catch (MechanismFileException e) {
            InputChecks.errorMessage(e.getMessage(), FILE.toString(), input);
            return;
        }
        if (mechanism == null) {
            throw new AssertionError("load returned null");
        }
        final List<String> problems = MechanismValidation.problems(mechanism);
        for (String p : problems) {
            InputChecks.userText("validation message", p, input);
        }
        if (!MechanismValidation.errors(mechanism).isEmpty()) {
            return;
        }
        try {
            MechanismAdapter.pivotInertia(mechanism);
            MechanismAdapter.parts(mechanism);
        } catch (IllegalArgumentException e) {
            InputChecks.userText("refusal of a valid mechanism", String.valueOf(e.getMessage()), input);
        }
    }
}
