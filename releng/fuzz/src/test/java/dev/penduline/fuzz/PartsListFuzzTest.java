package dev.penduline.fuzz;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Timeout;

import com.code_intelligence.jazzer.junit.FuzzTest;

import dev.penduline.physics.inertia.GivenTensor;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.TensorCheck;
import dev.penduline.records.RecordFormatException;
import dev.penduline.records.parts.PartsList;
import dev.penduline.records.parts.PartsListReader;

/**
 * Fuzzes {@link PartsListReader#read(Path)} with arbitrary bytes as the file's content.
 *
 * <p>Each input must either give a parts list or raise a {@link RecordFormatException} whose
 * message names the file and passes {@link InputChecks}; any other exception, an error (out of
 * memory, stack overflow) or a hang (the timeout) is a finding. A list that is read must keep
 * what the reader promises: every part with a name, a finite positive mass, a finite centroid,
 * a quantity of at least 1 and, for a tensor part, a physical tensor; at most one part per line;
 * every warning starting with the file name.
 */
@Timeout(value = 10, unit = TimeUnit.SECONDS)
class PartsListFuzzTest {

    private static final Path FILE = InputChecks.scratch("parts.csv");

    @FuzzTest
    void partsList(byte[] input) throws IOException {
        InputChecks.write(FILE, input);
        final PartsList list;
        try {
            list = new PartsListReader().read(FILE);
        } catch (RecordFormatException e) {
            InputChecks.errorMessage(e.getMessage(), FILE.toString(), input);
            return;
        }
        check(list, input);
    }

    private static void check(PartsList list, byte[] input) {
        final long lines = new String(input, StandardCharsets.UTF_8).lines().count();
        if (list.parts().size() > lines) {
            throw new AssertionError(list.parts().size() + " parts from " + lines + " lines");
        }
        for (Part p : list.parts()) {
            if (p.name() == null || p.name().isBlank()) {
                throw new AssertionError("a part without a name: " + p);
            }
            if (!(p.mass() > 0) || !Double.isFinite(p.mass())) {
                throw new AssertionError("part '" + p.name() + "' has the mass " + p.mass());
            }
            if (!Double.isFinite(p.centroid().getX()) || !Double.isFinite(p.centroid().getY())
                    || !Double.isFinite(p.centroid().getZ())) {
                throw new AssertionError("part '" + p.name() + "' has the centroid " + p.centroid());
            }
            if (p.quantity() < 1) {
                throw new AssertionError("part '" + p.name() + "' has the quantity " + p.quantity());
            }
            if (p.shape() == null) {
                throw new AssertionError("part '" + p.name() + "' has no shape");
            }
            if (p.shape() instanceof GivenTensor
                    && !TensorCheck.violations(p.centroidalInertia()).isEmpty()) {
                throw new AssertionError("tensor part '" + p.name() + "' passed with an unphysical tensor: "
                        + TensorCheck.violations(p.centroidalInertia()));
            }
        }
        for (String w : list.warnings()) {
            if (!w.startsWith(list.source())) {
                throw new AssertionError("a warning that does not name the file: " + InputChecks.visible(w));
            }
            InputChecks.userText("warning", w, input);
        }
    }
}
