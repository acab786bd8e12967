package dev.penduline.model.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.emf.common.util.Diagnostic;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import dev.penduline.model.AngleUnit;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.InspectionHatch;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.ShapeKind;
import dev.penduline.model.TestSession;
import dev.penduline.model.naming.NamedElements;

class MechanismValidationTest {

    @Test
    void theInspectionHatchIsValid() {
        assertEquals(List.of(), MechanismValidation.problems(InspectionHatch.create()));
        assertEquals(Diagnostic.OK, MechanismValidation.validate(InspectionHatch.create()).getSeverity());
    }

    @Test
    void everyProblemIsReportedAtOnceNamingItsElement() {
        final Mechanism m = NamedElements.mechanism("Broken hatch");
        m.setGravity(-9.8);
        final Part rib = NamedElements.addPart(m, "rib");
        rib.setMass(-0.2);
        final Part bar = NamedElements.addPart(m, "bar");
        bar.setShape(ShapeKind.SLENDER_ROD);
        bar.setMass(1);
        final Part washer = NamedElements.addPart(m, "washer");
        washer.setMass(0.01);
        washer.setQuantity(0);
        final Part latch = NamedElements.addPart(m, "latch");
        latch.setShape(ShapeKind.MASS_PROPERTIES);
        latch.setMass(0.2);
        latch.setIxx(1e-4);
        latch.setIyy(1e-4);
        latch.setIzz(3e-4);
        final FrictionHypothesis h = NamedElements.addHypothesis(m, "dry");
        NamedElements.addTerm(h, FrictionKind.COULOMB).setValue(0.05);
        NamedElements.addTerm(h, FrictionKind.STICTION).setValue(0.02);
        final TestSession s = NamedElements.addSession(m, "drop", "../elsewhere/drop.csv");
        s.setTimeColumnName("t");
        s.setAngleUnit(AngleUnit.COUNT);
        s.setContentHash("0".repeat(64));
        NamedElements.addFitResult(m, "fit", "yesterday");

        final List<String> problems = MechanismValidation.problems(m);
        final List<String> expected = List.of(
                "mechanism 'Broken hatch': gravity must be positive (got -9.8 m/s²)",
                "part 'rib': mass must be positive (got -0.2 kg); for a hole, give the removed material's positive"
                        + " mass and mark it as a cut-out",
                "part 'bar': length must be positive for a rod (got 0.0 m)",
                "part 'washer': quantity must be at least 1 (got 0)",
                "hypothesis 'dry': stiction 0.02 N·m is below the Coulomb friction 0.05 N·m; static friction is at"
                        + " least the sliding one (Ts ≥ Tc)",
                "session 'drop': record path '../elsewhere/drop.csv' leaves the project folder; keep the records"
                        + " inside it",
                "session 'drop': give the angle column's name or number",
                "session 'drop': angles in encoder counts need the counts per revolution",
                "fit 'fit': computedAt 'yesterday' is not an ISO-8601 date and time with offset"
                        + " (e.g. 2026-09-14T10:15:30Z)");
        for (String e : expected) {
            assertTrue(problems.contains(e), "missing: " + e + "\nin: " + problems);
        }
        final long tensorProblems = problems.stream().filter(p -> p.startsWith("part 'latch': inertia tensor ")).count();
        assertTrue(tensorProblems >= 1, "the tensor check names the part: " + problems);
        assertEquals(expected.size() + tensorProblems, problems.size(), "nothing else: " + problems);
    }

    @Test
    void diagnosticsCarryTheElementAndTheRuleCode() {
        final Mechanism m = InspectionHatch.create();
        final Part handle = m.getParts().get(2);
        handle.setQuantity(0);
        final Diagnostic d = MechanismValidation.validate(m);
        assertEquals(Diagnostic.ERROR, d.getSeverity());
        final Diagnostic leaf = d.getChildren().get(0);
        assertEquals(MechanismRule.SOURCE, leaf.getSource());
        assertEquals(MechanismRule.QUANTITY.code(), leaf.getCode());
        assertEquals(handle, leaf.getData().get(0));
    }

    @Test
    void cutOutLargerThanItsSolidFailsTheInertiaEnginesBound() {
        final Mechanism m = NamedElements.mechanism("Hatch");
        final Part lid = NamedElements.addPart(m, "lid");
        lid.setMass(1.0);
        lid.setCentroidY(-0.1);
        final Part hole = NamedElements.addPart(m, "hole");
        hole.setMass(0.5);
        hole.setCentroidY(-0.5);
        hole.setCutout(true);
        // J0 = 1·0.1² − 0.5·0.5² < 0 < M·Lc²: no body has less inertia than its mass at its
        // centroid (parallel-axis theorem; docs/physics.md §2 "Inertia about the pivot").
        final List<String> problems = MechanismValidation.errors(m);
        assertEquals(1, problems.size(), problems.toString());
        assertTrue(problems.get(0).startsWith("mechanism 'Hatch': inertia about the pivot J0 = "), problems.get(0));
        assertTrue(problems.get(0).contains("cut-out 'hole'"), problems.get(0));
    }

    @Test
    void tensorBreakingTheTriangleInequalityIsRefused() {
        final Mechanism m = NamedElements.mechanism("Hatch");
        final Part latch = NamedElements.addPart(m, "latch");
        latch.setShape(ShapeKind.MASS_PROPERTIES);
        latch.setMass(0.2);
        latch.setCentroidY(-0.3);
        // Principal moments 1, 1, 3 (×1e-4): Ixx + Iyy < Izz, impossible for a real body since
        // each moment is a sum of two of the non-negative second moments (Goldstein, Classical
        // Mechanics, §5.3).
        latch.setIxx(1e-4);
        latch.setIyy(1e-4);
        latch.setIzz(3e-4);
        final List<String> problems = MechanismValidation.errors(m);
        assertTrue(problems.stream().allMatch(p -> p.startsWith("part 'latch': inertia tensor")), problems.toString());
        assertTrue(!problems.isEmpty());
    }

    @Test
    void verticalAxisAndZeroAxisAreRefused() {
        final Mechanism m = InspectionHatch.create();
        m.setAxisDirectionZ(0);
        assertTrue(MechanismValidation.errors(m).get(0).startsWith("mechanism 'Inspection hatch': the pivot axis"
                + " direction must be a non-zero vector"), MechanismValidation.errors(m).toString());
        m.setAxisDirectionY(1);
        assertTrue(MechanismValidation.errors(m).get(0).contains("is parallel to the pivot axis"),
                MechanismValidation.errors(m).toString());
    }

    @ParameterizedTest
    @ValueSource(strings = {"records/release-30.csv", "release.csv", "./records/../release.csv", "a/b/c.txt"})
    void relativePathsInsideTheProjectAreAccepted(String path) {
        assertNull(SessionRules.recordPathProblem(path));
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "/home/lab/release.csv", "C:/lab/release.csv", "records\\release.csv",
        "../release.csv", "records/../../release.csv", "file:records/a.csv", ".", "records/.."})
    void pathsOutsideTheProjectOrAbsoluteAreRefused(String path) {
        assertTrue(SessionRules.recordPathProblem(path) != null, path);
    }

    /** A second session of a record the hatch already has, as a hand-edited file would hold it. */
    private static TestSession secondSession(Mechanism m, String name, String path, String hash) {
        final TestSession s = NamedElements.addSession(m, name, path);
        s.setTimeColumnName("t");
        s.setAngleColumnName("angle");
        s.setAngleUnit(AngleUnit.DEGREE);
        s.setContentHash(hash);
        return s;
    }

    @Test
    void twoSessionsOfOneRecordPathAreAWarningNamingBoth() {
        final Mechanism m = InspectionHatch.create();
        secondSession(m, "Again", "./records/x/../release-30.csv", "1".repeat(64));
        assertEquals(List.of(), MechanismValidation.errors(m));
        assertEquals(List.of("session 'Again': has the same record as session 'Release at 30°' (records/release-30.csv);"
                + " a fit would count that release twice: remove one of the two sessions"), MechanismValidation.problems(m));
        final Diagnostic leaf = MechanismValidation.validate(m).getChildren().get(0);
        assertEquals(Diagnostic.WARNING, leaf.getSeverity());
        assertEquals(MechanismRule.RECORD_DUPLICATE.code(), leaf.getCode());
    }

    @Test
    void twoSessionsOfOneContentUnderTwoNamesAreAWarning() {
        final Mechanism m = InspectionHatch.create();
        final String hash = m.getSessions().get(0).getContentHash();
        secondSession(m, "Copy", "records/copy-of-30.csv", hash);
        assertEquals(List.of("session 'Copy': its record records/copy-of-30.csv has the same content (SHA-256) as the record"
                + " of session 'Release at 30°' (records/release-30.csv); a fit would count that release twice: remove one of"
                + " the two sessions"), MechanismValidation.problems(m));
    }

    @Test
    void sessionsOfDifferentRecordsAreNoDuplicates() {
        final Mechanism m = InspectionHatch.create();
        secondSession(m, "Other", "records/release-45.csv", "2".repeat(64));
        secondSession(m, "Unhashed", "records/release-50.csv", null);
        assertEquals(List.of("session 'Unhashed': has no content hash, so a change to the record file would go unnoticed"),
                MechanismValidation.problems(m));
    }

    @Test
    void duplicateIdentifiersAreReported() {
        final Mechanism m = InspectionHatch.create();
        m.getParts().get(1).setId("lid-plate");
        assertEquals(List.of("part 'Rib': identifier 'lid-plate' is already used by part 'Lid plate'; identifiers"
                + " must be unique"), MechanismValidation.errors(m));
    }
}
