package dev.penduline.ui.tests;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.resources.IFile;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;

import dev.penduline.ui.internal.wizard.MechanismProjectCreation;

/** The INVENTED test data the workbench tests share. */
final class TestMechanisms {

    /**
     * INVENTED test mechanism: a slender rod 0.8 m, 2 kg, pivoted at its end, with a disc 3 kg of
     * radius 0.1 m whose centre is 0.9 m below the pivot. By the handbook's formulas (slender rod
     * about its end m·L²/3; disc about its axis m·r²/2 and the parallel-axis theorem m·d²):
     * J0 = 0.426667 + 0.015 + 2.43 = 2.871667 kg·m².
     */
    static final String ROD_AND_DISC = """
            # INVENTED test data for the workbench test, not a real product.
            name,shape,mass_kg,x_mm,y_mm,z_mm,length_mm,radius_mm,inner_radius_mm,axis
            arm,rod,2,0,-400,0,800,,,y
            bob,cylinder,3,0,-900,0,20,100,0,z
            """;

    private TestMechanisms() {
    }

    /**
     * A workspace project holding the rod-and-disc mechanism, made as the New Mechanism Project
     * wizard makes it (from the parts list, which lies in {@code scratch}).
     *
     * @param scratch a folder for the parts list
     * @param project the project's name, e.g. {@code editor-arm}
     * @param title   the mechanism's name
     * @return the mechanism file
     * @throws Exception when the project cannot be made
     */
    static IFile rodAndDisc(Path scratch, String project, String title) throws Exception {
        Path csv = Files.writeString(scratch.resolve(project + "-parts.csv"), ROD_AND_DISC, StandardCharsets.UTF_8);
        return MechanismProjectCreation.create(project, title, Optional.of(csv), null).mechanismFile();
    }

    /**
     * Every control below a composite, depth first.
     *
     * @param root the composite
     * @return its descendants
     */
    static List<Control> widgets(Composite root) {
        List<Control> out = new ArrayList<>();
        for (Control c : root.getChildren()) {
            out.add(c);
            if (c instanceof Composite k) {
                out.addAll(widgets(k));
            }
        }
        return out;
    }
}
