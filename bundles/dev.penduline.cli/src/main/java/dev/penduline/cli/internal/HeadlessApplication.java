package dev.penduline.cli.internal;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;

import dev.penduline.cli.PendulineCommandLine;

/**
 * The command line run inside OSGi ({@code -application dev.penduline.cli.headless}). Slower to
 * start than the plain {@code java -cp} entry; there for an installed product without the script.
 */
public final class HeadlessApplication implements IApplication {

    @Override
    public Object start(IApplicationContext context) {
        String[] args = (String[]) context.getArguments().get(IApplicationContext.APPLICATION_ARGS);
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code = new PendulineCommandLine().run(args == null ? new String[0] : args, out, err).code();
        out.flush();
        err.flush();
        return Integer.valueOf(code);
    }

    @Override
    public void stop() {
        // Commands run to completion; nothing to interrupt.
    }
}
