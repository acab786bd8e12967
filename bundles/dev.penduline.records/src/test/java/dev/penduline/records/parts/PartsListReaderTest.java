package dev.penduline.records.parts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.penduline.physics.inertia.Cylinder;
import dev.penduline.physics.inertia.GivenTensor;
import dev.penduline.physics.inertia.InertiaSummary;
import dev.penduline.physics.inertia.Part;
import dev.penduline.physics.inertia.PivotInertia;
import dev.penduline.records.RecordFormatException;

/** The parts-list reader: a full bill of materials, unit suffixes, and every class of error. */
class PartsListReaderTest {

    /**
     * Swing-arm rig. By hand (Meriam &amp; Kraige, Dynamics, Table D/4 formulas plus the
     * parallel-axis theorem, pivot = z through the origin):
     * <pre>
     *   arm   rod 1.2 kg, 0.8 m, centre 0.4 m below: 1.2×0.64/12 + 1.2×0.16       = 0.256
     *   bob   disc 3 kg, r 0.1, centre 0.8 m below:  3×0.01/2 + 3×0.64           = 1.935
     *   bolts 4 × 0.05 kg points at 0.8 m (z = 0.02 does not count): 0.2×0.64    = 0.128
     *   hub   tube 0.2 kg, ro 0.03, ri 0.01 on the axis: 0.2×(0.0009+0.0001)/2   = 0.0001
     *   bore  cut-out, steel 7850 kg/m³, r 0.02, 20 mm long, at 0.8 m:
     *         m = 7850×π×0.0004×0.02 = 0.1972920186 kg; J = m×(0.0002 + 0.64)   = 0.1263063503
     *   J0 = 0.256 + 1.935 + 0.128 + 0.0001 − 0.1263063503 = 2.1927936497 kg·m²
     *   M  = 1.2 + 3 + 0.2 + 0.2 − 0.1972920186 = 4.4027079814 kg
     * </pre>
     */
    private static final String BOM = String.join("\n",
            "# Swing-arm rig: pivot = z axis through the origin, gravity along -y",
            "name,shape,mass_kg,density_kg_m3,x_m,y_m,z_m,length_m,radius_m,inner_radius_m,axis,cutout,quantity,colour",
            "arm,rod,1.2,,0,-0.4,0,0.8,,,y,false,1,red",
            "bob,cylinder,3.0,,0,-0.8,0,0.02,0.1,0,z,,,grey",
            "\"bolt, M8\",point,0.05,,0,-0.8,0.02,,,,,,4,",
            "",
            "hub,cylinder,0.2,,0,0,0,0.05,0.03,0.01,Z,,,",
            "bore,cylinder,,7850,0,-0.8,0,0.02,0.02,,z,TRUE,,");

    private static final String FILE = "parts.csv";

    private static PartsList read(String text) throws IOException, RecordFormatException {
        return new PartsListReader().read(new StringReader(text), FILE);
    }

    private static RecordFormatException failure(String text) {
        return assertThrows(RecordFormatException.class, () -> read(text));
    }

    @Test
    void fullBillOfMaterialsGivesTheHandComputedInertia() throws Exception {
        final PartsList list = read(BOM);
        assertEquals(5, list.parts().size());
        assertEquals("bolt, M8", list.parts().get(2).name());
        assertEquals(4, list.parts().get(2).quantity());
        assertTrue(list.parts().get(4).cutout());
        final InertiaSummary s = PivotInertia.DEFAULT.compute(list.parts());
        assertEquals(2.1927936497, s.pivotInertia(), 1e-10);
        assertEquals(4.4027079814, s.totalMass(), 1e-10);
        assertEquals(List.of("parts.csv:2: column 'colour' is not a parts-list column and is ignored"),
                list.warnings());
    }

    @Test
    void unitSuffixesAreConvertedOnImport() throws Exception {
        // The same rig in g, mm, cm, in and g/cm³: 1.2 kg = 1200 g, 0.1 m = 0.1/0.0254 in (exact
        // international inch, NIST SP 811), 7850 kg/m³ = 7.85 g/cm³.
        final String imperialish = String.join("\n",
                "name,shape,mass_g,mass_tol_g,density_g_cm3,x_mm,y_mm,z_cm,length_mm,radius_in,inner_radius_mm,axis,cutout,qty",
                "arm,rod,1200,5,,0,-400,0,800,,,y,false,1",
                "bob,cylinder,3000,,,0,-800,0,20," + (0.1 / 0.0254) + ",0,z,,",
                "bolt,point,50,,,0,-800,2,,,,,,4",
                "hub,cylinder,200,,,0,0,0,50," + (0.03 / 0.0254) + ",10,z,,",
                "bore,cylinder,,,7.85,0,-800,0,20," + (0.02 / 0.0254) + ",,z,true,");
        final PartsList si = read(BOM);
        final PartsList converted = read(imperialish);
        assertEquals(PivotInertia.DEFAULT.compute(si.parts()).pivotInertia(),
                PivotInertia.DEFAULT.compute(converted.parts()).pivotInertia(), 1e-12);
        final Part arm = converted.parts().get(0);
        assertEquals(1.2, arm.mass(), 1e-15);
        assertEquals(-0.4, arm.centroid().getY(), 1e-15);
        assertEquals(0.005, arm.tolerance().mass(), 1e-18);
        assertEquals(0.02, ((Cylinder) converted.parts().get(4).shape()).radius(), 1e-15);
    }

    @Test
    void tensorPartsReadAllSixComponentsInAnyUnit() throws Exception {
        // 1 g·mm² = 1e-9 kg·m² (SI prefixes); products are tensor elements, read with their sign.
        final PartsList list = read(String.join("\n",
                "shape,name,mass_kg,x_m,y_m,z_m,ixx_g_mm2,iyy_g_mm2,izz_g_mm2,ixy_g_mm2,ixz_g_mm2,iyz_g_mm2",
                "tensor,bracket,0.5,0.1,-0.3,0,2000,3000,4000,-500,0,100"));
        final GivenTensor t = (GivenTensor) list.parts().get(0).shape();
        assertEquals(4e-6, t.tensor().zz(), 1e-21);
        assertEquals(-5e-7, t.tensor().xy(), 1e-21);
        assertEquals(1e-7, t.tensor().yz(), 1e-21);
        // J0 about z = Izz + m(x² + y²) = 4e-6 + 0.5 × 0.1 = 0.050004 kg·m² (parallel-axis theorem)
        assertEquals(0.050004, PivotInertia.DEFAULT.compute(list.parts()).pivotInertia(), 1e-15);
    }

    @Test
    void badCellNamesFileLineAndColumn() {
        final RecordFormatException e = failure(String.join("\n",
                "name,shape,mass_kg,x_m,y_m,z_m",
                "a,point,1,0,-1,0",
                "# a comment line still counts as a line",
                "b,point,abc,0,-1,0"));
        assertEquals("parts.csv:4: column 'mass_kg': 'abc' is not a number", e.getMessage());
        assertEquals(FILE, e.getFileName());
        assertEquals(4, e.getLineNumber());
        assertEquals("mass_kg", e.getColumnName());
    }

    @Test
    void nearMissesOfKnownNamesAreErrorsNamingTheIntendedColumn() {
        final RecordFormatException e = failure("name,shape,mass_kg,x_m,y_m,z_m,lenght_m\n");
        assertEquals("parts.csv:1: column 'lenght_m': is not a parts-list column; did you mean 'length_m'?",
                e.getMessage());
        assertTrue(failure("name,shape,mass_kg,x_m,y_m,z_m,lenght_mm\n").getMessage().contains("'length_mm'"));
        assertTrue(failure("nmae,shape,mass_kg,x_m,y_m,z_m\n").getMessage().contains("'name'"));
        assertTrue(failure("name,shape,mass_kg,x_m,y_m,z_m,cutuot\n").getMessage().contains("'cutout'"));
    }

    @Test
    void unknownColumnsAreWarnedAndIgnored() throws Exception {
        final PartsList list = read("name,shape,mass_kg,x_m,y_m,z_m,note,supplier\nw,point,1,0,-1,0,spare,ACME\n");
        assertEquals(1, list.parts().size());
        assertEquals(2, list.warnings().size());
        assertTrue(list.warnings().get(0).contains("'note'"), list.warnings().toString());
    }

    @Test
    void missingRequiredColumnsAreNamed() {
        final RecordFormatException e = failure("# header follows\nname,shape,y_m,z_m\n");
        assertEquals("parts.csv:2: missing required columns 'x_m', 'mass_kg' (or 'density_kg_m3')", e.getMessage());
    }

    @Test
    void headerMistakes() {
        assertTrue(failure("name,shape,mass_mm,x_m,y_m,z_m\n").getMessage()
                .contains("column 'mass_mm': mm is a unit of length but mass is a mass"));
        assertTrue(failure("name,shape,mass,x_m,y_m,z_m\n").getMessage().contains("needs a unit suffix, e.g. 'mass_kg'"));
        assertTrue(failure("name,shape,mass_kg,mass_g,x_m,y_m,z_m\n").getMessage()
                .contains("column 'mass_g': gives the same value as column 'mass_kg'"));
        assertTrue(failure("").getMessage().contains("no header"));
    }

    @Test
    void shapeMistakesAreErrorsAtTheirLine() throws Exception {
        final String h = "name,shape,mass_kg,density_kg_m3,x_m,y_m,z_m,length_m,radius_m,inner_radius_m,axis,cutout,quantity\n";
        assertEquals("parts.csv:2: column 'shape': 'cube' is not a shape: use one of point, rod, box, cylinder,"
                + " sphere, ring, tensor", failure(h + "a,cube,1,,0,0,0,,,,,,\n").getMessage());
        // the shape is echoed as typed (a fuzz finding: it was shown lowercased, unlike the input)
        assertTrue(failure(h + "a,Cube,1,,0,0,0,,,,,,\n").getMessage().contains("'Cube' is not a shape"));
        // the words mechanism files used for shapes before they took the parts list's words are refused, with the list
        for (String former : new String[] {"point-mass", "slender-rod", "thin-ring", "mass-properties"}) {
            assertEquals("parts.csv:2: column 'shape': '" + former + "' is not a shape: use one of point, rod, box,"
                    + " cylinder, sphere, ring, tensor", failure(h + "a," + former + ",1,,0,0,0,,,,,,\n").getMessage());
        }
        assertEquals(1, read(h + "a,POINT,1,,0,-1,0,,,,,,\n").parts().size(), "shapes are not case-sensitive");
        assertEquals("parts.csv:2: column 'axis': empty, but it is needed by a rod (x, y or z)",
                failure(h + "a,rod,1,,0,0,0,0.5,,,,,\n").getMessage());
        assertTrue(failure(h + "a,rod,1,,0,0,0,0.5,,,w,,\n").getMessage().contains("'w' is not an axis"));
        assertEquals("parts.csv:2: column 'radius_m': empty, but it is needed by a sphere",
                failure(h + "a,sphere,1,,0,0,0,,,,,,\n").getMessage());
        assertTrue(failure("name,shape,mass_kg,x_m,y_m,z_m\na,box,1,0,0,0\n").getMessage()
                .contains("column 'length_m' is needed by a box, but the file has no such column"));
        assertTrue(failure(h + "a,point,,7850,0,0,0,,,,,,\n").getMessage().contains("a point has no volume"));
        assertTrue(failure(h + "a,sphere,1,7850,0,0,0,,0.1,,,,\n").getMessage().contains("not both"));
        assertTrue(failure(h + "a,point,,,0,0,0,,,,,,\n").getMessage().contains("column 'mass_kg': empty"));
        assertTrue(failure(h + "a,point,-2,,0,0,0,,,,,,\n").getMessage().contains("'-2' must be greater than zero"));
        assertTrue(failure(h + "a,cylinder,1,,0,0,0,0.1,0.05,0.05,z,,\n").getMessage()
                .contains("column 'inner_radius_m'"));
        assertEquals("parts.csv:2: column 'cutout': 'maybe' is not true or false",
                failure(h + "a,point,1,,0,0,0,,,,,maybe,\n").getMessage());
        assertEquals("parts.csv:2: column 'quantity': '2.5' is not a whole number from 1 to 1000000",
                failure(h + "a,point,1,,0,0,0,,,,,,2.5\n").getMessage());
        assertTrue(failure(h + "a,point,NaN,,0,0,0,,,,,,\n").getMessage().contains("'NaN' is not a number"));
        assertTrue(failure(h + ",point,1,,0,0,0,,,,,,\n").getMessage().contains("column 'name': empty"));
    }

    @Test
    void cellsTheShapeDoesNotUseAreWarned() throws Exception {
        final PartsList list = read("name,shape,mass_kg,x_m,y_m,z_m,radius_m\na,point,1,0,-1,0,0.1\n");
        assertEquals(List.of("parts.csv:2: column 'radius_m' is not used by a point and is ignored"), list.warnings());
    }

    @Test
    void inadmissibleTensorIsAnErrorAtItsLine() {
        final RecordFormatException e = failure(String.join("\n",
                "name,shape,mass_kg,x_m,y_m,z_m,ixx_kg_m2,iyy_kg_m2,izz_kg_m2,ixy_kg_m2,ixz_kg_m2,iyz_kg_m2",
                "bad,tensor,1,0,-1,0,1,1,3,0,0,0"));
        assertEquals(2, e.getLineNumber());
        assertTrue(e.getMessage().contains("triangle"), e.getMessage());
    }

    @Test
    void csvDetails() throws Exception {
        final PartsList list = read("\uFEFFname,shape,mass_kg,x_m,y_m,z_m\n"
                + "  # indented comment\n"
                + "\"say \"\"hi\"\"\", point , 1 ,0,-1,0\n"
                + ",,,,,\n");
        assertEquals("say \"hi\"", list.parts().get(0).name());
        assertEquals(1, list.parts().size());
        assertEquals("parts.csv:2: the line has more fields than the header; quote fields that contain commas",
                failure("name,shape,mass_kg,x_m,y_m,z_m\nbolt, M8,point,1,0,-1,0\n").getMessage());
        assertEquals("parts.csv:2: field 1 opens a quote that is not closed on this line",
                failure("name,shape,mass_kg,x_m,y_m,z_m\n\"bolt,point,1,0,-1,0\n").getMessage());
    }

    @Test
    void readingAFileNeverWritesIt(@TempDir Path dir) throws Exception {
        final Path file = dir.resolve("rig.csv");
        Files.writeString(file, BOM, StandardCharsets.UTF_8);
        final FileTime before = FileTime.fromMillis(1_000_000_000_000L);
        Files.setLastModifiedTime(file, before);
        final byte[] bytes = Files.readAllBytes(file);
        assertEquals(5, new PartsListReader().read(file).parts().size());
        assertArrayEquals(bytes, Files.readAllBytes(file));
        assertEquals(before, Files.getLastModifiedTime(file));
        final Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "name,shape,mass_kg,x_m,y_m,z_m\na,point,x,0,0,0\n", StandardCharsets.UTF_8);
        final RecordFormatException e = assertThrows(RecordFormatException.class, () -> new PartsListReader().read(bad));
        assertTrue(e.getMessage().startsWith(bad + ":2: column 'mass_kg'"), e.getMessage());
    }
}
