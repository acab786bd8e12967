package dev.penduline.ui.internal.editor;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Map;

import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.forms.widgets.FormToolkit;

import dev.penduline.model.AngleUnit;
import dev.penduline.model.TestSession;
import dev.penduline.model.TimeUnit;
import dev.penduline.services.SessionRecords;

/**
 * The test sessions: each swing record the mechanism holds, where it lies in the project, whether
 * its content still has the SHA-256 stored when it was added, and how its columns are read (the
 * mapping). The raw records are never changed here; a session can be renamed, remapped or
 * removed (its record stays on disk).
 */
final class SessionsPage extends EditorPage {

    /** The page's id. */
    static final String ID = "sessions";

    private record Hashed(long modified, long size, String sha256) {
    }

    private final Map<Path, Hashed> hashes = new HashMap<>();
    private EditableTable<TestSession> table;

    SessionsPage(MechanismEditor editor) {
        super(editor, ID, "Test Sessions");
    }

    @Override
    String introduction() {
        return "Each session is one swing record, kept unchanged under the project's records/ folder. \"record\" says"
                + " whether the file is still the one that was added (its SHA-256). A column is named or numbered (1 is the"
                + " first); angles in counts need the encoder's counts per revolution.";
    }

    @Override
    void fill(Composite body, FormToolkit tk) {
        table = newTable(body, 110);
        table.textColumn("name", 130, TestSession::getName, (s, t) -> {
            if (t.isBlank()) {
                throw new IllegalArgumentException("a session needs a name");
            }
            MechanismEdits.run(document(), "Rename session " + s.getName(), () -> s.setName(t));
        });
        table.column("record path", 200, TestSession::getRecordPath);
        table.column("record", 130, this::hashState);
        table.textColumn("time column", 90, s -> column(s.getTimeColumnName(), s.isSetTimeColumnNumber(),
                s.getTimeColumnNumber()), (s, t) -> setColumn(s, t, true));
        table.choiceColumn("time unit", 70, s -> s.getTimeUnit().getLiteral(),
                TimeUnit.VALUES.stream().map(TimeUnit::getLiteral).toList(),
                (s, t) -> MechanismEdits.run(document(), "Set time unit of " + s.getName(), () -> s.setTimeUnit(TimeUnit.get(t))));
        table.textColumn("angle column", 90, s -> column(s.getAngleColumnName(), s.isSetAngleColumnNumber(),
                s.getAngleColumnNumber()), (s, t) -> setColumn(s, t, false));
        table.choiceColumn("angle unit", 70, s -> s.getAngleUnit().getLiteral(),
                AngleUnit.VALUES.stream().map(AngleUnit::getLiteral).toList(),
                (s, t) -> MechanismEdits.run(document(), "Set angle unit of " + s.getName(),
                        () -> s.setAngleUnit(AngleUnit.get(t))));
        table.textColumn("counts/rev", 80, s -> s.isSetCountsPerRevolution() ? Integer.toString(s.getCountsPerRevolution()) : "",
                this::setCounts);
        table.textColumn("notes", 200, s -> s.getNotes() == null ? "" : s.getNotes(),
                (s, t) -> MechanismEdits.run(document(), "Set notes of " + s.getName(), () -> s.setNotes(t.isBlank() ? null : t)));
        Composite row = buttonRow(body, tk);
        button(row, tk, "Remove Session", this::remove);
    }

    private static String column(String name, boolean numbered, int number) {
        if (name != null && !name.isBlank()) {
            return name;
        }
        return numbered ? Integer.toString(number) : "";
    }

    private void setColumn(TestSession s, String text, boolean time) {
        String label = "Set " + (time ? "time" : "angle") + " column of " + s.getName();
        if (text.matches("\\d+")) {
            int n = Integer.parseInt(text);
            if (n < 1) {
                throw new IllegalArgumentException("columns are numbered from 1");
            }
            MechanismEdits.run(document(), label, () -> {
                if (time) {
                    s.setTimeColumnName(null);
                    s.setTimeColumnNumber(n);
                } else {
                    s.setAngleColumnName(null);
                    s.setAngleColumnNumber(n);
                }
            });
        } else {
            String name = text.isBlank() ? null : text;
            MechanismEdits.run(document(), label, () -> {
                if (time) {
                    s.setTimeColumnName(name);
                    s.unsetTimeColumnNumber();
                } else {
                    s.setAngleColumnName(name);
                    s.unsetAngleColumnNumber();
                }
            });
        }
    }

    private void setCounts(TestSession s, String text) {
        if (text.isBlank()) {
            MechanismEdits.run(document(), "Clear counts per revolution of " + s.getName(), s::unsetCountsPerRevolution);
            return;
        }
        int n;
        try {
            n = Integer.parseInt(text.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("counts per revolution is a whole number, not '" + text + "'", e);
        }
        if (n < 1) {
            throw new IllegalArgumentException("counts per revolution is at least 1");
        }
        MechanismEdits.run(document(), "Set counts per revolution of " + s.getName(), () -> s.setCountsPerRevolution(n));
    }

    /**
     * Whether a session's record is still the one added.
     *
     * @param s the session
     * @return the state's words, with the short hash when unchanged
     */
    String hashState(TestSession s) {
        String[] hash = new String[1];
        SessionRecords.RecordState state = SessionRecords.recordState(document().path(), s, file -> {
            hash[0] = cachedHash(file);
            return hash[0];
        });
        return state == SessionRecords.RecordState.UNCHANGED ? state.words() + " " + SessionRecords.shortHash(hash[0])
                : state.words();
    }

    /** The record's SHA-256, hashed again only when its size or time changed (the page refreshes on every edit). */
    private String cachedHash(Path file) throws IOException {
        long modified = Files.getLastModifiedTime(file).toMillis();
        long size = Files.size(file);
        Hashed h = hashes.get(file);
        if (h == null || h.modified() != modified || h.size() != size) {
            h = new Hashed(modified, size, SessionRecords.sha256(file));
            hashes.put(file, h);
        }
        return h.sha256();
    }

    private void remove() {
        removeSelected(table, TestSession.class, "session", "Remove", TestSession::getName, mechanism().getSessions(), false);
    }

    @Override
    void show() {
        table.show(new ArrayList<>(mechanism().getSessions()));
    }

    @Override
    boolean reveal(String elementId) {
        return select(table, mechanism().getSessions(), TestSession::getId, elementId);
    }

}
