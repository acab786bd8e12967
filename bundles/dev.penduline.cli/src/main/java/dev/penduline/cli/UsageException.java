package dev.penduline.cli;

/** A mistake on the command line or in an input file: reported as one line, exit code 2. */
public class UsageException extends Exception {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message what is wrong and, where it helps, what to do instead
     */
    public UsageException(String message) {
        super(message);
    }
}
