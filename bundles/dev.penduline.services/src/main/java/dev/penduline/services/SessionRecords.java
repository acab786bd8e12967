package dev.penduline.services;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;

import dev.penduline.model.AngleUnit;
import dev.penduline.model.DecimalSeparator;
import dev.penduline.model.Delimiter;
import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.model.TimeUnit;
import dev.penduline.model.naming.NamedElements;
import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.model.persistence.SaveLock;
import dev.penduline.physics.InvalidValueException;
import dev.penduline.physics.units.Unit;
import dev.penduline.records.PlainText;
import dev.penduline.records.RecordFormatException;
import dev.penduline.records.swing.ColumnChoice;
import dev.penduline.records.swing.SwingImportOptions;
import dev.penduline.records.swing.SwingRecord;
import dev.penduline.records.swing.SwingRecordMapping;
import dev.penduline.records.swing.SwingRecordReader;

/**
 * Swing-test records and the test sessions of a mechanism file: reading a raw record, adding it
 * to a project (the raw file is copied into the project's {@code records/} folder when it lives
 * elsewhere, never modified, and referred to by a relative path with its SHA-256), and reading
 * a session's record back with the mapping stored in the file.
 */
public final class SessionRecords {

    /** The folder, beside the mechanism file, that holds the raw records a project carries. */
    public static final String RECORDS_FOLDER = "records";

    private SessionRecords() {
    }

    /**
     * Reads a raw swing record.
     *
     * @param file    the record
     * @param options how to read it (detected where not given)
     * @return the record in SI units
     * @throws InputException naming file, line and column when it cannot be read
     */
    public static SwingRecord read(Path file, SwingImportOptions options) throws InputException {
        try {
            return new SwingRecordReader().read(file, options);
        } catch (IOException | RecordFormatException e) {
            throw ReadableFiles.problem(file, e);
        } catch (InvalidValueException e) {
            throw new InputException(file + ": " + e.getMessage(), e);
        }
    }

    /** What adding a session did. */
    public record Added(TestSession session, SwingRecord record, boolean copied, Path storedAt) {
    }

    /**
     * Adds a record to a mechanism file as a new test session and saves the file. A record
     * outside the project folder is copied into {@code records/} first; an existing different
     * file of the same name there is never overwritten.
     *
     * @param mechanismFile the mechanism file (its folder is the project)
     * @param recordFile    the raw record
     * @param options       how to read it
     * @param name          the session's name (null: the record's file name)
     * @param releaseAngle  the release angle if known (rad), NaN if not
     * @param notes         notes, or null
     * @return the new session and the record as read
     * @throws InputException when a file cannot be read, copied or saved
     */
    public static Added addSession(Path mechanismFile, Path recordFile, SwingImportOptions options, String name,
            double releaseAngle, String notes) throws InputException {
        return addSession(mechanismFile, recordFile, options, name, releaseAngle, notes, note -> { });
    }

    /**
     * Adds a record to a mechanism file as a new test session, as
     * {@link #addSession(Path, Path, SwingImportOptions, String, double, String)}, holding the
     * file's save lock from reading the mechanism file to saving it, so that sessions added at the
     * same time by other writers are kept.
     *
     * @param mechanismFile the mechanism file (its folder is the project)
     * @param recordFile    the raw record
     * @param options       how to read it
     * @param name          the session's name (null: the record's file name)
     * @param releaseAngle  the release angle if known (rad), NaN if not
     * @param notes         notes, or null
     * @param saveNotes     receives notes of the save for the user
     * @return the new session and the record as read
     * @throws InputException when a file cannot be read, copied, locked or saved
     */
    public static Added addSession(Path mechanismFile, Path recordFile, SwingImportOptions options, String name,
            double releaseAngle, String notes, Consumer<String> saveNotes) throws InputException {
        try (SaveLock lock = MechanismStore.lock(mechanismFile)) {
            return addLocked(mechanismFile, recordFile, options, name, releaseAngle, notes, saveNotes);
        }
    }

    private static Added addLocked(Path mechanismFile, Path recordFile, SwingImportOptions options, String name,
            double releaseAngle, String notes, Consumer<String> saveNotes) throws InputException {
        Mechanism mechanism = MechanismLoader.readMechanism(mechanismFile);
        Pending pending = pending(mechanism, mechanismFile, recordFile, options, name, releaseAngle, notes);
        TestSession session = pending.addTo(mechanism);
        MechanismStore.check(mechanism, mechanismFile);
        boolean copied = pending.copyIn();
        try {
            MechanismStore.save(mechanism, mechanismFile).forEach(saveNotes);
        } catch (InputException e) {
            if (copied) {
                deleteQuietly(pending.storedAt());
            }
            throw e;
        }
        return new Added(session, pending.record(), copied, pending.storedAt());
    }

    /**
     * A record read and checked to become a session of a mechanism, not yet added: where it
     * will lie in the project, its session's name, the record as read with its mapping.
     *
     * @param source       the record as given
     * @param storedAt     where the session's record lies in the project (the source itself when
     *                     it is inside, else under {@code records/})
     * @param relative     the session's record path, relative to the project, '/' separated
     * @param name         the session's name
     * @param record       the record as read
     * @param releaseAngle the release angle if known (rad), NaN if not
     * @param notes        notes, or null
     */
    public record Pending(Path source, Path storedAt, String relative, String name, SwingRecord record,
            double releaseAngle, String notes) {

        /**
         * Adds the session to a mechanism (for an undoable command: nothing else is touched).
         *
         * @param mechanism the mechanism
         * @return the new session, with the mapping and the record's SHA-256
         */
        public TestSession addTo(Mechanism mechanism) {
            TestSession session = NamedElements.addSession(mechanism, name, relative);
            store(session, record.mapping());
            session.setContentHash(record.sha256());
            if (!Double.isNaN(releaseAngle)) {
                session.setReleaseAngle(releaseAngle);
            }
            if (notes != null) {
                session.setNotes(PlainText.note(notes));
            }
            return session;
        }

        /**
         * Copies the record into the project's {@code records/} folder when it lies outside; an
         * existing different file of that name is never overwritten.
         *
         * @return true when a copy was made (false: in place, or the same content was there)
         * @throws InputException when the copy fails or a different file has the name
         */
        public boolean copyIn() throws InputException {
            return !storedAt.equals(source) && copyInto(source, storedAt, record.sha256());
        }
    }

    /**
     * Reads and checks a record to be added to a mechanism as a session, as {@code add-session}
     * does, without changing anything.
     *
     * @param mechanism     the mechanism as it is now (sessions already there, or about to be added, count)
     * @param mechanismFile the mechanism file (its folder is the project)
     * @param recordFile    the raw record
     * @param options       how to read it
     * @param name          the session's name (null: the record's file name)
     * @param releaseAngle  the release angle if known (rad), NaN if not
     * @param notes         notes, or null
     * @return the pending session
     * @throws InputException when the record cannot be read, lies outside through a link, is a
     *                        session already, or the name is not usable
     */
    public static Pending pending(Mechanism mechanism, Path mechanismFile, Path recordFile, SwingImportOptions options,
            String name, double releaseAngle, String notes) throws InputException {
        Path project = projectOf(mechanismFile);
        Path source = recordFile.toAbsolutePath().normalize();
        Path stored = source.startsWith(project) ? source
                : project.resolve(RECORDS_FOLDER).resolve(source.getFileName());
        String relative = project.relativize(stored).toString().replace('\\', '/');
        requireInside(project, stored, relative);
        SwingRecord record = read(recordFile, options);
        requireNew(mechanism, mechanismFile, project, stored.equals(source) ? stored : null, record);
        String sessionName = name != null ? name : source.getFileName().toString().replaceFirst("\\.[^.]*$", "");
        Optional<String> badName = PlainText.nameProblem(sessionName);
        if (badName.isPresent()) {
            throw new InputException("the session's name " + (name != null ? "" : "(the record's file name) ") + badName.get()
                    + (name != null ? "" : "; give another with --name"));
        }
        return new Pending(source, stored, relative, sessionName, record, releaseAngle, notes);
    }

    /**
     * Refuses a record the mechanism already has as a session, by path or by content: two sessions of one
     * record would count the same release twice in a fit. {@code inPlace} is the record when it lies in the
     * project already, null when it is to be copied in (a different file under a session's name is then
     * refused by the copy, as any clash of names).
     */
    private static void requireNew(Mechanism mechanism, Path mechanismFile, Path project, Path inPlace, SwingRecord record)
            throws InputException {
        for (TestSession s : mechanism.getSessions()) {
            if (s.getRecordPath() == null) {
                continue;
            }
            boolean samePath = project.resolve(s.getRecordPath()).normalize().equals(inPlace);
            boolean sameContent = record.sha256().equalsIgnoreCase(s.getContentHash());
            if (samePath || sameContent) {
                throw new InputException(record.source() + ": " + (samePath ? "is already the record of session '"
                        + s.getName() + "'" : "has the same content (SHA-256 " + shortHash(record.sha256())
                        + ") as the record of session '" + s.getName() + "' (" + s.getRecordPath() + ")") + " in "
                        + mechanismFile + "; a record is added once (a second session of it would count the same release"
                        + " twice); nothing was changed");
            }
        }
    }

    /**
     * Refuses a record path that leads out of the project folder through a symbolic link (the path itself, or a
     * folder on the way): the project would then depend on a file it does not carry. Paths are checked as
     * written; {@code ..} and absolute paths are refused by the mechanism file's validation.
     *
     * @param project the project folder (the mechanism file's folder)
     * @param file    the record, inside the project folder as written
     * @param shown   the record's path as the user knows it (relative to the project)
     * @throws InputException naming the link, where it leads, and what to do
     */
    static void requireInside(Path project, Path file, String shown) throws InputException {
        Path realProject;
        try {
            realProject = project.toRealPath();
        } catch (IOException e) {
            realProject = project;
        }
        Path current = project;
        for (Path part : project.relativize(file)) {
            current = current.resolve(part);
            if (!Files.isSymbolicLink(current)) {
                continue;
            }
            Path target;
            try {
                target = current.toRealPath();
            } catch (IOException e) {
                target = linkTarget(current);
            }
            // a link that leads nowhere is judged by what it says, which is relative to the path as written
            if (!target.startsWith(realProject) && !target.startsWith(project)) {
                String link = project.relativize(current).toString().replace('\\', '/');
                throw new InputException((link.equals(shown) ? shown : shown + ": " + link) + " is a symbolic link to "
                        + target + ", outside the project folder " + project + "; copy the record into " + RECORDS_FOLDER
                        + "/ instead");
            }
        }
    }

    /** Where a link points, as written in it (for a link that leads nowhere). */
    private static Path linkTarget(Path link) {
        try {
            return link.getParent().resolve(Files.readSymbolicLink(link)).normalize();
        } catch (IOException e) {
            return link;
        }
    }

    /**
     * The first digits of a SHA-256, enough to tell two contents apart in a message.
     *
     * @param sha256 the hash in hexadecimal
     * @return its first twelve digits and an ellipsis
     */
    public static String shortHash(String sha256) {
        return sha256 == null ? "none" : sha256.length() <= 12 ? sha256 : sha256.substring(0, 12) + "…";
    }

    /**
     * A session's record as read back, with warnings about it (e.g. a changed raw file).
     *
     * @param session  the session
     * @param file     where its record lies
     * @param record   the record as read now
     * @param warnings what the reader and the check of the stored hash found
     */
    public record SessionRecord(TestSession session, Path file, SwingRecord record, List<String> warnings) {

        /**
         * Whether the record's content differs from the one the session was added with.
         *
         * @return true when the stored SHA-256 is not the record's
         */
        public boolean changed() {
            return changeOf(session, record).isPresent();
        }
    }

    /**
     * Where a session's record lies, checked before it is opened: inside the project folder even
     * through symbolic links, present, and a regular file.
     *
     * @param mechanismFile the mechanism file
     * @param session       the session
     * @return the record file
     * @throws InputException naming the session, the file and what to do
     */
    public static Path recordFile(Path mechanismFile, TestSession session) throws InputException {
        Path project = projectOf(mechanismFile);
        String relative = session.getRecordPath();
        Path file = project.resolve(relative).normalize();
        try {
            requireInside(project, file, relative);
        } catch (InputException e) {
            throw new InputException("session '" + session.getName() + "': " + e.getMessage(), e);
        }
        if (!Files.exists(file)) {
            throw new InputException("session '" + session.getName() + "': its record " + relative + " is missing (no such"
                    + " file in " + project + "); put the record back (from version control or the rig's copy), or fit"
                    + " other records with --session");
        }
        ReadableFiles.require(file, "a swing record (a .csv file)");
        return file;
    }

    /**
     * Reads the record of a test session with the mapping stored in the mechanism file, and
     * warns when the raw file's content no longer matches the stored hash.
     *
     * @param mechanismFile the mechanism file
     * @param session       the session
     * @return the record
     * @throws InputException when the record is missing, outside the project, not a regular file or unreadable
     */
    public static SessionRecord readSession(Path mechanismFile, TestSession session) throws InputException {
        Path file = recordFile(mechanismFile, session);
        SwingRecord record = read(file, optionsOf(session));
        List<String> warnings = new ArrayList<>();
        changeOf(session, record).ifPresent(warnings::add);
        return new SessionRecord(session, file, record, warnings);
    }

    /**
     * Checks every session's record without reading it as a record: where it lies (inside the
     * project, present, a regular file) and whether its content still has the stored hash. For a
     * command that does not need the records (the inertia), so the problems are warnings.
     *
     * @param mechanismFile the mechanism file
     * @return one warning per session whose record is missing, outside, not a regular file, unreadable or changed
     * @throws InputException when the mechanism file cannot be read
     */
    public static List<String> recordWarnings(Path mechanismFile) throws InputException {
        List<String> warnings = new ArrayList<>();
        for (TestSession s : MechanismLoader.readMechanism(mechanismFile).getSessions()) {
            try {
                Path file = recordFile(mechanismFile, s);
                changeOf(s, sha256(file)).ifPresent(c -> warnings.add(c + " ('penduline fit' refuses it until told to"
                        + " accept it)"));
            } catch (InputException e) {
                warnings.add(e.getMessage());
            } catch (IOException e) {
                warnings.add("session '" + s.getName() + "': " + s.getRecordPath() + " cannot be read (" + e.getMessage() + ")");
            }
        }
        return warnings;
    }

    /** Whether a session's record is still the one that was added, in the words the workbench shows. */
    public enum RecordState {
        /** Present, with the stored SHA-256. */
        UNCHANGED("unchanged"),
        /** Present, with another SHA-256 than the stored one. */
        CHANGED("changed since added"),
        /** Present; the session stores no hash to compare with. */
        NO_HASH("no hash stored"),
        /** Not where the session says. */
        MISSING("missing"),
        /** Outside the project, through a link, or not a regular file. */
        NOT_USABLE("not usable"),
        /** There, but it cannot be read. */
        UNREADABLE("unreadable");

        private final String words;

        RecordState(String words) {
            this.words = words;
        }

        /** @return the state as the workbench shows it */
        public String words() {
            return words;
        }
    }

    /** How the state of a record is hashed (a cache may stand in for {@link SessionRecords#sha256(Path)}). */
    @FunctionalInterface
    public interface Hasher {
        /**
         * The SHA-256 of a file.
         *
         * @param file the file
         * @return the hash in lower-case hexadecimal
         * @throws IOException when it cannot be read
         */
        String sha256(Path file) throws IOException;
    }

    /**
     * Whether a session's record is still the one that was added, without reading it as a record.
     *
     * @param mechanismFile the mechanism file
     * @param session       the session
     * @param hasher        hashes the record (e.g. {@code SessionRecords::sha256})
     * @return the state
     */
    public static RecordState recordState(Path mechanismFile, TestSession session, Hasher hasher) {
        Path file;
        try {
            file = recordFile(mechanismFile, session);
        } catch (InputException e) {
            return Files.exists(projectOf(mechanismFile).resolve(String.valueOf(session.getRecordPath())).normalize())
                    ? RecordState.NOT_USABLE : RecordState.MISSING;
        }
        try {
            String now = hasher.sha256(file);
            if (session.getContentHash() == null || session.getContentHash().isBlank()) {
                return RecordState.NO_HASH;
            }
            return changeOf(session, now).isPresent() ? RecordState.CHANGED : RecordState.UNCHANGED;
        } catch (IOException e) {
            return RecordState.UNREADABLE;
        }
    }

    /**
     * Says so when a session's record has changed since it was added: its SHA-256 is not the stored one.
     *
     * @param session the session
     * @param record  its record as read now
     * @return the message (session, file, both hashes shortened), or empty when unchanged or no hash is stored
     */
    public static Optional<String> changeOf(TestSession session, SwingRecord record) {
        return changeOf(session, record.sha256());
    }

    /**
     * Says so when a session's record has changed since it was added.
     *
     * @param session the session
     * @param now     the SHA-256 of its record as it is now
     * @return the message (session, file, both hashes shortened), or empty when unchanged or no hash is stored
     */
    public static Optional<String> changeOf(TestSession session, String now) {
        String stored = session.getContentHash();
        if (stored == null || stored.isBlank() || stored.equalsIgnoreCase(now)) {
            return Optional.empty();
        }
        return Optional.of("session '" + session.getName() + "': " + session.getRecordPath() + " has changed since it was"
                + " added: its SHA-256 is now " + shortHash(now) + ", the mechanism file holds " + shortHash(stored));
    }

    /**
     * The session of a mechanism file whose record is the given file.
     *
     * @param mechanismFile the mechanism file
     * @param record        the record file
     * @return the session, or empty when no session of the file refers to that record
     * @throws InputException when the mechanism file cannot be read
     */
    public static Optional<TestSession> sessionFor(Path mechanismFile, Path record) throws InputException {
        Mechanism mechanism = MechanismLoader.readMechanism(mechanismFile);
        Path project = projectOf(mechanismFile);
        Path wanted = record.toAbsolutePath().normalize();
        for (TestSession s : mechanism.getSessions()) {
            if (s.getRecordPath() != null && project.resolve(s.getRecordPath()).normalize().equals(wanted)) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    /**
     * The import options that read a session's record the way it was read when it was added.
     *
     * @param s the session
     * @return the options
     */
    public static SwingImportOptions optionsOf(TestSession s) {
        SwingImportOptions o = SwingImportOptions.defaults()
                .withDelimiter(switch (s.getDelimiter()) {
                    case SEMICOLON -> ';';
                    case TAB -> '\t';
                    default -> ',';
                })
                .withDecimalSeparator(s.getDecimalSeparator() == DecimalSeparator.COMMA ? ',' : '.');
        boolean header = s.getTimeColumnName() != null && !s.getTimeColumnName().isEmpty();
        o = o.withHeader(header);
        o = o.withTimeColumn(header ? ColumnChoice.byName(s.getTimeColumnName())
                : ColumnChoice.byIndex(s.isSetTimeColumnNumber() ? s.getTimeColumnNumber() : 1));
        o = o.withAngleColumn(header && s.getAngleColumnName() != null ? ColumnChoice.byName(s.getAngleColumnName())
                : ColumnChoice.byIndex(s.isSetAngleColumnNumber() ? s.getAngleColumnNumber() : 2));
        o = o.withTimeUnit(switch (s.getTimeUnit()) {
            case MILLISECOND -> Unit.MILLISECOND;
            case MICROSECOND -> Unit.MICROSECOND;
            default -> Unit.SECOND;
        });
        if (s.getAngleUnit() == AngleUnit.COUNT) {
            o = o.withAngleUnit(Unit.ENCODER_COUNT).withCountsPerRevolution(s.getCountsPerRevolution());
        } else {
            o = o.withAngleUnit(s.getAngleUnit() == AngleUnit.RADIAN ? Unit.RADIAN : Unit.DEGREE);
        }
        return o;
    }

    private static void store(TestSession s, SwingRecordMapping m) {
        s.setDelimiter(switch (m.delimiter()) {
            case ';' -> Delimiter.SEMICOLON;
            case '\t' -> Delimiter.TAB;
            default -> Delimiter.COMMA;
        });
        s.setDecimalSeparator(m.decimalSeparator() == ',' ? DecimalSeparator.COMMA : DecimalSeparator.POINT);
        if (m.header()) {
            s.setTimeColumnName(m.timeColumn().name());
            s.setAngleColumnName(m.angleColumn().name());
        } else {
            s.setTimeColumnNumber(m.timeColumn().index());
            s.setAngleColumnNumber(m.angleColumn().index());
        }
        String timeSuffix = m.timeUnit().suffix();
        s.setTimeUnit(timeSuffix.equals(Unit.MILLISECOND.suffix()) ? TimeUnit.MILLISECOND
                : timeSuffix.equals(Unit.MICROSECOND.suffix()) ? TimeUnit.MICROSECOND : TimeUnit.SECOND);
        String angleSuffix = m.angleUnit().suffix();
        if (angleSuffix.equals(Unit.ENCODER_COUNT.suffix())) {
            s.setAngleUnit(AngleUnit.COUNT);
            s.setCountsPerRevolution((int) Math.round(m.countsPerRevolution()));
        } else {
            s.setAngleUnit(angleSuffix.equals(Unit.RADIAN.suffix()) ? AngleUnit.RADIAN : AngleUnit.DEGREE);
        }
    }

    private static boolean copyInto(Path source, Path target, String sha256) throws InputException {
        try {
            if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                ReadableFiles.require(target, "a swing record (a .csv file)");
                if (sha256(target).equalsIgnoreCase(sha256)) {
                    return false;
                }
                throw new InputException(target + ": a different file of that name is already in the project; rename"
                        + " the record before adding it");
            }
            if (Files.isSymbolicLink(target)) {
                throw new InputException(target + ": is a symbolic link (to nothing); a record is copied into the project"
                        + " only as a new file: remove the link or rename the record before adding it");
            }
            Files.createDirectories(target.getParent());
            // under the mechanism file's lock, just checked not to exist: a new file, never a replaced one
            AtomicFileWrite.write(target, out -> Files.copy(source, out));
            if (!sha256(target).equalsIgnoreCase(sha256)) {
                throw new InputException(target + ": the copy differs from " + source + "; the record was not added");
            }
            return true;
        } catch (IOException e) {
            throw new InputException(target + ": cannot copy the record into the project (" + AtomicFileWrite.reason(e) + ")",
                    e);
        }
    }

    /**
     * The project folder of a mechanism file: the folder of the file the path names, so that a
     * mechanism file reached through a symbolic link finds its records beside its real self.
     *
     * @param mechanismFile the mechanism file (or a link to it)
     * @return the folder, absolute
     */
    static Path projectOf(Path mechanismFile) {
        if (Files.isSymbolicLink(mechanismFile)) {
            try {
                return AtomicFileWrite.resolve(mechanismFile).getParent();
            } catch (IOException e) {
                // a broken link: reading the file will say so
            }
        }
        return mechanismFile.toAbsolutePath().getParent();
    }

    private static void deleteQuietly(Path file) {
        try {
            Files.deleteIfExists(file);
        } catch (IOException ignored) {
            // the copy is identical to the user's record; leaving it behind loses nothing
        }
    }

    /**
     * The SHA-256 of a file's content, read in blocks (a long record is never held whole).
     *
     * @param file the file
     * @return the hash in lowercase hexadecimal
     * @throws IOException when the file cannot be read
     */
    public static String sha256(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            byte[] buffer = new byte[1 << 16];
            for (int n = in.read(buffer); n >= 0; n = in.read(buffer)) {
                digest.update(buffer, 0, n);
            }
            return HexFormat.of().formatHex(digest.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("the JDK always provides SHA-256", e);
        }
    }
}
