package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.Mechanism;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.ui.internal.problems.MechanismProblems;
import dev.penduline.ui.internal.problems.MechanismProblems.ElementKind;
import dev.penduline.ui.internal.problems.MechanismProblems.Problem;
import dev.penduline.ui.internal.problems.MechanismProblems.Severity;

/**
 * The problems of a mechanism file are what the loader, the validation and the sessions' record
 * checks say, each on its element; the messages are the services' own (checked against what the
 * loader itself reports for the same file).
 */
class MechanismProblemsTest {

    @TempDir
    Path project;
    @TempDir
    Path scratch;
    private ProblemFiles files;

    @BeforeEach
    void makeFiles() throws Exception {
        files = new ProblemFiles(project, scratch);
    }

    @Test
    void aValidFileHasNoProblems() {
        assertEquals(List.of(), MechanismProblems.of(files.valid));
    }

    @Test
    void aPartOfNegativeMassIsAnErrorOnThatPart() throws Exception {
        List<Problem> problems = MechanismProblems.of(files.badPart);
        Problem mass = only(problems, ElementKind.PART);
        assertEquals(Severity.ERROR, mass.severity());
        assertEquals("arm", mass.elementId());
        assertEquals("part 'arm'", mass.location());
        assertTrue(mass.message().startsWith("part 'arm': mass must be positive (got -2.0 kg)"), mass.message());
        assertEquals(0, mass.line(), "validation reports no line");
        // the errors are those the loader refuses the file with, one per line of its refusal
        String refusal = refusal(files.badPart);
        List<Problem> errors = problems.stream().filter(p -> p.severity() == Severity.ERROR).toList();
        for (Problem p : errors) {
            assertTrue(refusal.contains(p.message()), p.message() + " is not in the loader's refusal: " + refusal);
        }
        assertEquals(refusal.lines().count() - 1, errors.size(), "one error per line of the refusal: " + refusal);
    }

    @Test
    void aMissingRecordIsAnErrorAndAChangedOneAWarningOnTheirSessions() throws Exception {
        List<Problem> problems = MechanismProblems.of(files.sessions);
        assertEquals(2, problems.size(), problems.toString());
        Problem missing = problems.get(0);
        assertEquals(Severity.ERROR, missing.severity());
        assertEquals(ElementKind.SESSION, missing.kind());
        assertEquals(files.missingSession, missing.elementId());
        assertEquals("session 'release at 12'", missing.location());
        assertTrue(missing.message().contains("its record records/release-12deg.csv is missing"), missing.message());
        Problem changed = problems.get(1);
        assertEquals(Severity.WARNING, changed.severity());
        assertEquals(ElementKind.SESSION, changed.kind());
        assertEquals(files.changedSession, changed.elementId());
        assertTrue(changed.message().startsWith("session 'release at 30': records/release-30deg.csv has changed since it"
                + " was added"), changed.message());

        Files.write(files.changedRecord, files.changedRecordAsAdded);
        Files.writeString(files.missingRecord, "the record is back\n");
        Problem nowChanged = only(MechanismProblems.of(files.sessions), ElementKind.SESSION);
        assertEquals(files.missingSession, nowChanged.elementId(), "restored: only the other content is new");
        assertEquals(Severity.WARNING, nowChanged.severity());
    }

    @Test
    void aRecordPathTheValidationRefusesIsNotLookedForToo() throws Exception {
        Path outside = Files.writeString(project.resolve("outside.penduline"), Files.readString(files.sessions)
                .replace("<recordPath>records/release-12deg.csv</recordPath>", "<recordPath>../release-12deg.csv</recordPath>"));
        List<Problem> onSession = MechanismProblems.of(outside).stream()
                .filter(p -> files.missingSession.equals(p.elementId())).toList();
        assertEquals(1, onSession.size(), onSession.toString());
        assertEquals(Severity.ERROR, onSession.get(0).severity());
        assertTrue(refusal(outside).contains(onSession.get(0).message()), onSession.get(0).message());
    }

    @Test
    void aTermsProblemIsOnItsHypothesisAndAFitsOnTheFit() throws Exception {
        Mechanism m = MechanismFiles.load(files.valid);
        FrictionHypothesis h = NamedElements.addHypothesis(m, "dry and viscous");
        NamedElements.addTerm(h, FrictionKind.COULOMB).setLowerBound(-1);
        NamedElements.addFitResult(m, "first fit", "yesterday");
        Path file = project.resolve("fits.penduline");
        MechanismFiles.save(m, file);
        List<Problem> problems = MechanismProblems.of(file);
        Problem term = only(problems, ElementKind.HYPOTHESIS);
        assertEquals("dry-and-viscous", term.elementId(), "a term's problem is on the hypothesis that holds it");
        assertEquals("hypothesis 'dry and viscous'", term.location());
        assertTrue(term.message().contains("lower bound must be zero or positive"), term.message());
        Problem fit = problems.stream().filter(p -> p.kind() == ElementKind.FIT).findFirst().orElseThrow();
        assertEquals("first-fit", fit.elementId());
        assertEquals("fit 'first fit'", fit.location());
        assertTrue(fit.message().contains("yesterday"), fit.message());
    }

    @Test
    void anUnreadableFileIsOneErrorOnTheFileWithTheLoadersLine() {
        Problem p = only(MechanismProblems.of(files.broken), ElementKind.FILE);
        assertEquals(Severity.ERROR, p.severity());
        assertNull(p.elementId());
        assertEquals(ProblemFiles.BROKEN_LINE, p.line());
        assertTrue(p.location().startsWith("line " + ProblemFiles.BROKEN_LINE), p.location());
        assertTrue(p.message().startsWith("cannot be read: "), p.message());
        assertTrue(refusal(files.broken).endsWith(p.message().substring("cannot be read: ".length())), p.message());
    }

    @Test
    void aMissingFileIsOneErrorOnTheFile() {
        Problem p = only(MechanismProblems.of(project.resolve("gone.penduline")), ElementKind.FILE);
        assertEquals(Severity.ERROR, p.severity());
        assertTrue(p.message().contains("gone.penduline"), p.message());
    }

    private static Problem only(List<Problem> problems, ElementKind kind) {
        List<Problem> of = problems.stream().filter(p -> p.kind() == kind).toList();
        assertEquals(1, of.size(), "one problem on a " + kind.value() + ": " + problems);
        return of.get(0);
    }

    /** What the command line's loader says when it refuses the file. */
    private static String refusal(Path file) {
        try {
            new MechanismLoader().loadMechanismFile(file);
        } catch (InputException e) {
            return e.getMessage();
        }
        throw new AssertionError("the loader accepted " + file);
    }
}
