package dev.penduline.model.validation;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

import dev.penduline.model.AngleUnit;
import dev.penduline.model.DecimalSeparator;
import dev.penduline.model.Delimiter;
import dev.penduline.model.PendulinePackage.Literals;
import dev.penduline.model.TestSession;

/** The rules of a test session: where its record lies and how to read it. */
final class SessionRules {

    private static final Pattern SHA_256 = Pattern.compile("[0-9a-f]{64}");
    private static final Pattern DRIVE_OR_SCHEME = Pattern.compile("^[A-Za-z][A-Za-z0-9+.-]*:.*");

    private SessionRules() {
    }

    static String label(TestSession s) {
        return "session '" + (Problems.blank(s.getName()) ? (Problems.blank(s.getId()) ? "(unnamed)" : s.getId())
                : s.getName()) + "'";
    }

    static void check(TestSession s, Problems out) {
        final String who = label(s);
        if (Problems.blank(s.getId())) {
            out.error(MechanismRule.IDENTIFIER, s, Literals.TEST_SESSION__ID, who + ": has no identifier");
        }
        if (Problems.blank(s.getName())) {
            out.warning(MechanismRule.NAME, s, Literals.TEST_SESSION__NAME, who + ": has no name");
        }
        final String pathProblem = recordPathProblem(s.getRecordPath());
        if (pathProblem != null) {
            out.error(MechanismRule.RECORD_PATH, s, Literals.TEST_SESSION__RECORD_PATH, who + ": " + pathProblem);
        }
        column(s, "time", s.getTimeColumnName(), s.isSetTimeColumnNumber(), s.getTimeColumnNumber(), out);
        column(s, "angle", s.getAngleColumnName(), s.isSetAngleColumnNumber(), s.getAngleColumnNumber(), out);
        final boolean sameName = !Problems.blank(s.getTimeColumnName())
                && s.getTimeColumnName().equals(s.getAngleColumnName());
        final boolean sameNumber = s.isSetTimeColumnNumber() && s.isSetAngleColumnNumber()
                && s.getTimeColumnNumber() == s.getAngleColumnNumber();
        if (sameName || sameNumber) {
            out.error(MechanismRule.RECORD_COLUMNS, s, Literals.TEST_SESSION__ANGLE_COLUMN_NAME,
                    who + ": the time and angle columns are the same column");
        }
        if (s.isSetCountsPerRevolution() && s.getCountsPerRevolution() < 1) {
            out.error(MechanismRule.RECORD_COLUMNS, s, Literals.TEST_SESSION__COUNTS_PER_REVOLUTION,
                    who + ": counts per revolution must be at least 1 (got " + s.getCountsPerRevolution() + ")");
        } else if (s.getAngleUnit() == AngleUnit.COUNT && !s.isSetCountsPerRevolution()) {
            out.error(MechanismRule.RECORD_COLUMNS, s, Literals.TEST_SESSION__COUNTS_PER_REVOLUTION,
                    who + ": angles in encoder counts need the counts per revolution");
        }
        if (s.getDecimalSeparator() == DecimalSeparator.COMMA && s.getDelimiter() == Delimiter.COMMA) {
            out.error(MechanismRule.RECORD_COLUMNS, s, Literals.TEST_SESSION__DELIMITER,
                    who + ": a decimal comma cannot be read with commas between the columns");
        }
        if (Problems.blank(s.getContentHash())) {
            out.warning(MechanismRule.RECORD_HASH, s, Literals.TEST_SESSION__CONTENT_HASH,
                    who + ": has no content hash, so a change to the record file would go unnoticed");
        } else if (!SHA_256.matcher(s.getContentHash()).matches()) {
            out.error(MechanismRule.RECORD_HASH, s, Literals.TEST_SESSION__CONTENT_HASH, who + ": content hash '"
                    + s.getContentHash() + "' is not a SHA-256 (64 lower-case hexadecimal digits)");
        }
        if (s.isSetReleaseAngle() && !(Math.abs(s.getReleaseAngle()) <= Math.PI)) {
            out.error(MechanismRule.RECORD_COLUMNS, s, Literals.TEST_SESSION__RELEASE_ANGLE,
                    who + ": release angle must be within ±π rad (got " + s.getReleaseAngle() + " rad)");
        }
    }

    /**
     * Warns of sessions that share one record, by path (as written, {@code .} and {@code x/..} aside)
     * or by content hash: a fit would count the same release twice. A warning, not an error, so that a
     * hand-edited file still loads and the user can remove the extra session.
     *
     * @param sessions the sessions of one mechanism
     * @param out      where the problems go
     */
    static void duplicates(List<TestSession> sessions, Problems out) {
        final Map<String, TestSession> byPath = new HashMap<>();
        final Map<String, TestSession> byHash = new HashMap<>();
        for (TestSession s : sessions) {
            final String path = Problems.blank(s.getRecordPath()) || recordPathProblem(s.getRecordPath()) != null ? null
                    : normalised(s.getRecordPath());
            final TestSession samePath = path == null ? null : byPath.putIfAbsent(path, s);
            final String hash = Problems.blank(s.getContentHash()) ? null : s.getContentHash().toLowerCase(Locale.ROOT);
            final TestSession sameHash = hash == null ? null : byHash.putIfAbsent(hash, s);
            if (samePath != null) {
                out.warning(MechanismRule.RECORD_DUPLICATE, s, Literals.TEST_SESSION__RECORD_PATH, label(s)
                        + ": has the same record as " + label(samePath) + " (" + path + "); a fit would count that release"
                        + " twice: remove one of the two sessions");
            } else if (sameHash != null) {
                out.warning(MechanismRule.RECORD_DUPLICATE, s, Literals.TEST_SESSION__CONTENT_HASH, label(s) + ": its record "
                        + s.getRecordPath() + " has the same content (SHA-256) as the record of " + label(sameHash) + " ("
                        + sameHash.getRecordPath() + "); a fit would count that release twice: remove one of the two sessions");
            }
        }
    }

    /** A relative record path with {@code .}, empty and {@code x/..} segments taken out. */
    private static String normalised(String path) {
        final Deque<String> kept = new ArrayDeque<>();
        for (String segment : path.split("/")) {
            if (segment.equals("..")) {
                kept.pollLast();
            } else if (!segment.isEmpty() && !segment.equals(".")) {
                kept.addLast(segment);
            }
        }
        return String.join("/", kept);
    }

    /**
     * Why a record path is unacceptable, or null when it is a relative path inside the project.
     *
     * @param path the path as stored
     * @return the problem, or null
     */
    static String recordPathProblem(String path) {
        if (Problems.blank(path)) {
            return "has no record file path";
        }
        final String quoted = "record path '" + path + "'";
        if (path.indexOf('\\') >= 0) {
            return quoted + " must use '/' between folders";
        }
        if (path.startsWith("/") || DRIVE_OR_SCHEME.matcher(path).matches()) {
            return quoted + " must be relative to the project folder";
        }
        int depth = 0;
        for (String segment : path.split("/")) {
            if (segment.equals("..")) {
                depth--;
                if (depth < 0) {
                    return quoted + " leaves the project folder; keep the records inside it";
                }
            } else if (!segment.isEmpty() && !segment.equals(".")) {
                depth++;
            }
        }
        return depth == 0 ? quoted + " names the project folder, not a file" : null;
    }

    private static void column(TestSession s, String what, String name, boolean numberSet, int number, Problems out) {
        final String who = label(s);
        final boolean named = !Problems.blank(name);
        final var feature = what.equals("time") ? Literals.TEST_SESSION__TIME_COLUMN_NAME
                : Literals.TEST_SESSION__ANGLE_COLUMN_NAME;
        if (named && numberSet) {
            out.error(MechanismRule.RECORD_COLUMNS, s, feature,
                    who + ": give the " + what + " column by name or by number, not both");
        } else if (!named && !numberSet) {
            out.error(MechanismRule.RECORD_COLUMNS, s, feature,
                    who + ": give the " + what + " column's name or number");
        } else if (numberSet && number < 1) {
            out.error(MechanismRule.RECORD_COLUMNS, s, feature,
                    who + ": " + what + " column number must be at least 1, the first column (got " + number + ")");
        }
    }
}
