package dev.penduline.services.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.services.InputException;

/**
 * The journal keeps a row exactly (every double to the bit, text with tabs, bars, backslashes
 * and line ends), reuses only a fitted row of the same fingerprint and hashes, and ignores a
 * half-written line; the groupings make the units a user expects from names and a manifest.
 */
class SurveyJournalTest {

    @TempDir
    Path dir;

    private static SurveyRow row(String key, String sha, double viscous) {
        return new SurveyRow(key, List.of("line/" + key + ".csv"), List.of(sha), SurveyRow.FITTED, List.of("viscous", "coulomb"),
                List.of(new SurveyRow.Estimate("viscous", viscous, 1.0 / 3), new SurveyRow.Estimate("coulomb", 0.1 + 0.2,
                        Double.MIN_VALUE)), "mixed", 0.6295150988266717, 3.29e-6, List.of(1.02, Double.NaN),
                List.of("a warning with a | bar, a \\ backslash,\ta tab", "two\nlines"), "", "");
    }

    @Test
    void aRowReadsBackExactlyUnderItsFingerprintOnly() throws Exception {
        SurveyRow a = row("SN|1", "aa", 0.012345678901234567);
        SurveyRow failed = SurveyRow.failed(new SurveyUnit("SN2", List.of(Path.of("line/SN2.csv"))), List.of("bb"),
                "line/SN2.csv", "line/SN2.csv:3: column 'angle': 'x' is not a number");
        try (SurveyJournal j = SurveyJournal.open(dir)) {
            assertEquals(Optional.empty(), j.earlier("f1", "SN|1", List.of("aa")));
            j.append("f1", a);
            j.append("f1", failed);
        }
        // a crash in the middle of the next line
        Files.writeString(dir.resolve(SurveyJournal.FILE_NAME), "row\tf1\tSN3\tline/SN3.csv", StandardCharsets.UTF_8,
                StandardOpenOption.APPEND);
        try (SurveyJournal j = SurveyJournal.open(dir)) {
            assertEquals(Optional.of(a), j.earlier("f1", "SN|1", List.of("aa")));
            assertEquals(Optional.empty(), j.earlier("f2", "SN|1", List.of("aa")), "another fingerprint");
            assertEquals(Optional.empty(), j.earlier("f1", "SN|1", List.of("changed")), "another record content");
            assertEquals(Optional.empty(), j.earlier("f1", "SN2", List.of("bb")), "a failed unit is tried again");
            assertEquals(Optional.empty(), j.earlier("f1", "SN3", List.of("cc")), "the half-written line");
            j.append("f1", row("SN3", "cc", 0.5));
        }
        String text = Files.readString(dir.resolve(SurveyJournal.FILE_NAME));
        assertTrue(text.endsWith("\n") && text.lines().filter(l -> l.startsWith("row\t")).count() == 3, text);
    }

    @Test
    void unitsByPatternAndByManifest() throws Exception {
        Path line = Files.createDirectories(dir.resolve("line"));
        for (String n : List.of("SN2_r1.csv", "SN1_r2.csv", "SN1_r1.csv", "odd.csv", "notes.txt")) {
            Files.writeString(line.resolve(n), "x");
        }
        List<Path> records = SurveyGrouping.records(List.of(line));
        assertEquals(4, records.size(), "only *.csv: " + records);
        SurveyGrouping.Grouping g = SurveyGrouping.byPattern(records, Pattern.compile("^(SN\\d+)_"));
        assertEquals(List.of("SN1", "SN2"), g.units().stream().map(SurveyUnit::key).toList());
        assertEquals(List.of(line.resolve("SN1_r1.csv"), line.resolve("SN1_r2.csv")), g.units().get(0).files());
        assertEquals(1, g.unassigned().size());
        assertTrue(g.unassigned().get(0).error().contains("odd.csv"));
        // without a group the whole match is the key
        assertEquals(List.of("SN1", "SN2"), SurveyGrouping.byPattern(records, Pattern.compile("SN\\d"))
                .units().stream().map(SurveyUnit::key).toList());
        assertEquals(List.of("SN1_r1", "SN1_r2", "SN2_r1", "odd"), SurveyGrouping.perRecord(records).units().stream()
                .map(SurveyUnit::key).toList());

        Path manifest = Files.writeString(dir.resolve("list.csv"), """
                serial,file,comment
                "B, second",line/SN2_r1.csv,"a ""quoted"" note"
                A,line/SN1_r1.csv,
                ,line/odd.csv,
                """);
        SurveyGrouping.Grouping m = SurveyGrouping.byManifest(manifest, "serial");
        assertEquals(List.of("A", "B, second"), m.units().stream().map(SurveyUnit::key).toList());
        assertEquals(1, m.unassigned().size());
        assertTrue(m.unassigned().get(0).error().contains("list.csv: line 4, field 'serial'"), m.unassigned().toString());
        InputException e = assertThrows(InputException.class, () -> SurveyGrouping.byManifest(manifest, "hatch"));
        assertTrue(e.getMessage().contains("list.csv: line 1") && e.getMessage().contains("'hatch'"), e.getMessage());
    }
}
