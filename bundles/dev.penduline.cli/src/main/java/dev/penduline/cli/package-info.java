/**
 * Penduline's headless command line: {@code ./penduline COMMAND [OPTIONS]}.
 *
 * <p>Start from {@link dev.penduline.cli.Main}, the plain {@code java -cp} entry, which hands the
 * arguments to {@link dev.penduline.cli.PendulineCommandLine}. Each subcommand is a
 * {@link dev.penduline.cli.Command}; the command line only parses options and prints, the
 * computations live in the lower layers so that the workbench shows the same numbers.
 *
 * <p>Exit codes ({@link dev.penduline.cli.ExitCode}): 0 the command did its job, 1 a computation
 * failed (for example a fit did not converge), 2 a usage or input error (unknown command, bad
 * option, unreadable or malformed file), 3 some of a survey's units failed, 4 an internal error (a
 * defect of Penduline: its stack trace and a request to report it). Errors the user can cause are
 * one message naming the file, line and field; never a stack trace.
 */
package dev.penduline.cli;
