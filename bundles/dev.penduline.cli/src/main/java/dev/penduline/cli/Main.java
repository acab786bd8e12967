package dev.penduline.cli;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

/** The plain {@code java -cp} entry of the command line: no OSGi, fast start. */
public final class Main {

    private Main() {
    }

    /**
     * Runs one command and exits with its code.
     *
     * @param args the command and its options
     */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code = new PendulineCommandLine().run(args, out, err).code();
        out.flush();
        err.flush();
        System.exit(code);
    }
}
