package dev.penduline.services;

import java.io.IOException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

import dev.penduline.records.InputFiles;
import dev.penduline.records.RecordFormatException;

/** The services' side of {@link InputFiles}: the same check, with the answer as an {@link InputException}. */
final class ReadableFiles {

    private ReadableFiles() {
    }

    /**
     * Refuses a missing file or anything but a regular file (a named pipe, a device, a folder, a
     * socket) without opening it.
     *
     * @param file the file
     * @param what what it should be, for the advice
     * @throws InputException naming the file and what is wrong with it
     */
    static void require(Path file, String what) throws InputException {
        try {
            InputFiles.requireRegularFile(file, what);
        } catch (IOException | RecordFormatException e) {
            throw problem(file, e);
        }
    }

    /**
     * What a reader's failure means to the user: no such file, a file that cannot be read, or
     * the reader's own message (file, line, column).
     *
     * @param file the file being read
     * @param e    what the reader threw
     * @return the message as an input error, with the cause kept for the log
     */
    static InputException problem(Path file, Exception e) {
        if (e instanceof NoSuchFileException) {
            return new InputException(file + ": no such file", e);
        }
        if (e instanceof RecordFormatException r) {
            return new InputException(r);
        }
        return new InputException(file + ": cannot be read (" + e.getMessage() + ")", e);
    }
}
