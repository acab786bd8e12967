package dev.penduline.cli;

/** The process exit codes of the command line, documented in the README. */
public enum ExitCode {
    /** The command did its job. */
    OK(0),
    /** A computation failed: it ran but could not produce a trustworthy result. */
    COMPUTATION_FAILED(1),
    /** The command line or an input file is wrong; the message says where. */
    USAGE_OR_INPUT(2),
    /** Some items of a batch failed ({@code survey}: a record or unit), the others were done; the output lists each failure. */
    PARTIAL_FAILURE(3),
    /** A defect of Penduline, not of the input: the message asks to report it and the stack trace follows it. */
    INTERNAL_ERROR(4);

    private final int code;

    ExitCode(int code) {
        this.code = code;
    }

    /**
     * The numeric code handed to the operating system.
     *
     * @return 0, 1, 2, 3 or 4
     */
    public int code() {
        return code;
    }
}
