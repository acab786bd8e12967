package dev.penduline.services.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.services.DemoRecords;
import dev.penduline.services.FrictionIdentification;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;

/**
 * One unit's unforeseen failure (a stand-in fitter throws as a bug would) is that unit's row,
 * named a Penduline bug with its class; the other units are fitted, and a later run reuses them
 * and tries the failed one again. The fit itself is checked in dev.penduline.physics.identify.
 */
class SurveyRunTest {

    @TempDir
    Path dir;

    @Test
    void aBugInOneUnitIsItsRowAndTheOthersAreFitted() throws Exception {
        MechanismSource arm = MechanismLoader.lumped(2.5, 0.48, 0.75, 9.80665);
        List<SurveyUnit> units = new ArrayList<>();
        for (String key : List.of("a", "b", "c")) {
            Path record = dir.resolve(key + ".csv");
            DemoRecords.write(arm, new FrictionTorques(0.01, 0.04, 0, 0), new DemoRecords.Settings(Math.toRadians(30), 0,
                    Math.toRadians(0.02), 0, 1.0, 8, 100, key.charAt(0)), record);
            units.add(new SurveyUnit(key, List.of(record)));
        }
        SurveyRun.Settings settings = new SurveyRun.Settings(arm, SwingImportOptions.defaults(),
                Optional.of(EnumSet.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB)), false,
                FitSettings.defaults().withResampling(0, 1, true), "fingerprint");
        List<String> fitted = Collections.synchronizedList(new ArrayList<>());
        SurveyRun.Fitter fitter = (s, sessions) -> {
            fitted.add(sessions.get(0).name());
            if (sessions.get(0).name().equals("b")) {
                throw new NullPointerException("a stand-in for a bug");
            }
            return FrictionIdentification.identify(s.mechanism(), sessions, s.terms(), s.fixInertia(), s.fit(),
                    FitControl.none());
        };
        SurveyRun.Result first;
        try (SurveyJournal journal = SurveyJournal.open(dir.resolve("out"))) {
            first = SurveyRun.run(units, settings, journal, 2, (done, total) -> { }, fitter);
        }
        assertEquals(List.of("a", "b", "c"), first.rows().stream().map(SurveyRow::key).toList());
        assertEquals(2, first.fitted());
        assertEquals(1, first.failed());
        SurveyRow b = first.rows().get(1);
        assertEquals(SurveyRow.FAILED, b.status());
        assertTrue(b.error().contains("a Penduline bug") && b.error().contains("java.lang.NullPointerException")
                && b.error().contains("b.csv"), b.error());
        assertTrue(first.rows().get(0).fitted() && first.rows().get(2).fitted());

        fitted.clear();
        SurveyRun.Result second;
        try (SurveyJournal journal = SurveyJournal.open(dir.resolve("out"))) {
            second = SurveyRun.run(units, settings, journal, 1, (done, total) -> { }, fitter);
        }
        assertEquals(List.of("b"), fitted, "only the failed unit is fitted again");
        assertEquals(2, second.skipped());
        assertEquals(first.rows(), second.rows());
    }
}
