package dev.penduline.services;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.model.persistence.MechanismFileException;
import dev.penduline.model.persistence.MechanismFiles;
import dev.penduline.model.persistence.MechanismFormat;

/**
 * The output files a command writes on request ({@code simulate --out}, {@code demo-record
 * --out}): written by the one atomic writer ({@link AtomicFileWrite}), and never over an input.
 *
 * <p>What an output may replace, checked on the file a link names: nothing that is not a
 * regular file (a folder, a named pipe, a device); never a mechanism file (a {@code .penduline}
 * file or any file that loads as one), never a file inside a project's {@code records/} folder
 * (a folder of that name beside a mechanism file) and never the record of a test session of a
 * mechanism file in the output's folder or above it (up to {@value #LEVELS_UP} levels) — not
 * even when asked to; any other existing file only when the caller says so (the command line's
 * {@code --force}). A new file is always fine.
 */
public final class OutputFiles {

    /** Writes the content of a text file. */
    @FunctionalInterface
    public interface Content {
        /**
         * Writes the content.
         *
         * @param out the writer (UTF-8, buffered)
         * @throws IOException when writing fails
         */
        void writeTo(Writer out) throws IOException;
    }

    /** How many folders above an output are searched for mechanism files whose records it could be. */
    public static final int LEVELS_UP = 4;

    private static final int PEEK_BYTES = 4096;

    private OutputFiles() {
    }

    /**
     * Checks that an output may be written to a path, before any work is done for it.
     *
     * @param target    the output file
     * @param overwrite whether an existing plain file may be replaced (the command line's {@code --force})
     * @throws InputException naming the file and why it is not written
     */
    public static void check(Path target, boolean overwrite) throws InputException {
        Path parent = target.toAbsolutePath().getParent();
        if (!Files.isSymbolicLink(target) && parent != null && !Files.exists(parent)) {
            return; // a new file in a folder still to be made
        }
        Path file;
        try {
            file = AtomicFileWrite.resolve(target);
        } catch (IOException e) {
            throw new InputException(target + ": cannot be written (" + AtomicFileWrite.reason(e) + ")", e);
        }
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        String it = Files.isSymbolicLink(target) ? target + ": the file it links to, " + file + "," : target + ":";
        Optional<String> kind = AtomicFileWrite.notRegular(file);
        if (kind.isPresent()) {
            throw new InputException(it + " is " + kind.get() + ", not a regular file; an output is only written to a"
                    + " regular file (--force does not change that)");
        }
        if (isMechanismFile(file)) {
            throw new InputException(it + " is a mechanism file; an output never replaces one (--force does not change"
                    + " that): choose another output file");
        }
        Optional<String> record = recordOf(file);
        if (record.isPresent()) {
            throw new InputException(it + " is " + record.get() + "; an output never replaces a record (--force does"
                    + " not change that): choose another output file");
        }
        if (!overwrite) {
            throw new InputException(target + ": already exists; give --force to replace it, or choose another output"
                    + " file");
        }
    }

    /**
     * Checks the target (see {@link #check}) and writes a UTF-8 text file atomically.
     *
     * @param target    the file to create or replace
     * @param overwrite whether an existing plain file may be replaced
     * @param content   what to write
     * @return notes for the user (a temporary file of an interrupted save removed), possibly empty
     * @throws InputException naming the file when it may not or cannot be written; the old file is kept
     */
    public static List<String> write(Path target, boolean overwrite, Content content) throws InputException {
        check(target, overwrite);
        try {
            Path parent = target.toAbsolutePath().getParent();
            if (parent != null && !Files.isSymbolicLink(target) && !Files.isDirectory(parent)) {
                Files.createDirectories(parent);
            }
            return AtomicFileWrite.write(target, out -> {
                Writer w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
                content.writeTo(w);
                w.flush();
            });
        } catch (IOException e) {
            throw new InputException(target + ": " + AtomicFileWrite.reason(e), e);
        }
    }

    /** A {@code .penduline} file, or a file whose first bytes name the mechanism format and which loads. */
    private static boolean isMechanismFile(Path file) {
        if (file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith("." + MechanismFormat.FILE_EXTENSION)) {
            return true;
        }
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(PEEK_BYTES);
        } catch (IOException e) {
            return false;
        }
        String start = new String(head, StandardCharsets.UTF_8);
        if (!start.contains("Mechanism") || !start.stripLeading().replace("\uFEFF", "").startsWith("<")) {
            return false;
        }
        try {
            MechanismFiles.load(file);
            return true;
        } catch (MechanismFileException e) {
            return false;
        }
    }

    /** What makes the file a record of a project, in words, or empty. */
    private static Optional<String> recordOf(Path file) {
        Path folder = file.getParent();
        for (int level = 0; folder != null && level <= LEVELS_UP; level++, folder = folder.getParent()) {
            boolean recordsFolder = folder.getFileName() != null
                    && folder.getFileName().toString().equals(SessionRecords.RECORDS_FOLDER);
            if (recordsFolder && !mechanismFiles(folder.getParent()).isEmpty()) {
                return Optional.of("inside the records folder " + folder + " of a project");
            }
            for (Path m : mechanismFiles(folder)) {
                Optional<String> session = sessionWithRecord(m, file);
                if (session.isPresent()) {
                    return session;
                }
            }
        }
        return Optional.empty();
    }

    private static List<Path> mechanismFiles(Path folder) {
        if (folder == null) {
            return List.of();
        }
        try (DirectoryStream<Path> s = Files.newDirectoryStream(folder, "*." + MechanismFormat.FILE_EXTENSION)) {
            List<Path> found = new ArrayList<>();
            for (Path p : s) {
                if (Files.isRegularFile(p)) {
                    found.add(p);
                }
            }
            return found;
        } catch (IOException e) {
            return List.of();
        }
    }

    private static Optional<String> sessionWithRecord(Path mechanismFile, Path file) {
        Mechanism m;
        try {
            m = MechanismFiles.load(mechanismFile);
        } catch (MechanismFileException e) {
            return Optional.empty();
        }
        Path project = mechanismFile.getParent();
        for (TestSession s : m.getSessions()) {
            if (s.getRecordPath() == null) {
                continue;
            }
            try {
                Path record = project.resolve(s.getRecordPath());
                if (Files.exists(record) && Files.isSameFile(record, file)) {
                    return Optional.of("the record of session '" + s.getName() + "' in " + mechanismFile);
                }
            } catch (IOException | RuntimeException e) {
                // a path this system cannot resolve is no record of this file
            }
        }
        return Optional.empty();
    }
}
