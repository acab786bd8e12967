package dev.penduline.cli.commands;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Set;

import dev.penduline.cli.Arguments;
import dev.penduline.cli.Command;
import dev.penduline.cli.ExitCode;
import dev.penduline.cli.UsageException;
import dev.penduline.services.Defaults;
import dev.penduline.services.InputException;
import dev.penduline.services.PartsImport;

/** {@code penduline import-parts PARTS.csv --to FILE.penduline}: a mechanism file from a parts list. */
public final class ImportPartsCommand implements Command {

    @Override
    public String name() {
        return "import-parts";
    }

    @Override
    public String summary() {
        return "create a mechanism file from a parts-list CSV (BOM or CAD mass-property export)";
    }

    @Override
    public String usage() {
        return """
                Usage: penduline import-parts PARTS.csv --to FILE.penduline [--name NAME]
                       penduline import-parts PARTS.csv --into FILE.penduline

                Reads the parts list (columns as for 'penduline inertia') and writes a new mechanism
                file holding its parts in SI units, ready to be versioned next to the CAD. An
                existing file is never overwritten by --to. With --into, the parts of an existing
                mechanism file are replaced (when the CAD changed), its sessions and stored fits are
                kept, and the fits stored before are marked stale.

                  --to FILE     the mechanism file to create (.penduline)
                  --into FILE   the existing mechanism file whose parts to replace
                  --name NAME   the mechanism's name (default: the parts list's file name; --to only)

                With --use-preferences a new file (--to) gets the defaults file's gravity.""";
    }

    @Override
    public ExitCode run(List<String> args, Defaults defaults, PrintWriter out, PrintWriter err) throws UsageException {
        Arguments a = Arguments.parse(args, Set.of("to", "into", "name"), Set.of());
        if (a.positional().size() != 1 || a.has("to") == a.has("into")) {
            throw new UsageException("give one parts list and either --to FILE.penduline (a new file) or --into"
                    + " FILE.penduline (replace its parts). " + usage());
        }
        Path csv = Path.of(a.positional().get(0));
        if (a.has("into")) {
            if (a.has("name")) {
                throw new UsageException("--name names a new mechanism (--to); --into keeps the file's name");
            }
            try {
                for (String line : PartsImport.replaceParts(csv, Path.of(a.value("into")), Instant.now())) {
                    out.println(line);
                }
            } catch (InputException e) {
                throw new UsageException(e.getMessage());
            }
            return ExitCode.OK;
        }
        Path target = Path.of(a.value("to"));
        if (!target.getFileName().toString().endsWith(".penduline")) {
            throw new UsageException("--to " + target + ": a mechanism file must end in .penduline");
        }
        String name = a.has("name") ? a.value("name") : csv.getFileName().toString().replaceFirst("\\.[^.]*$", "");
        try {
            for (String w : PartsImport.importFile(csv, target, name, defaults.gravity())) {
                err.println("warning: " + w);
            }
        } catch (InputException e) {
            throw new UsageException(e.getMessage());
        }
        out.println("wrote " + target);
        return ExitCode.OK;
    }
}
