package dev.penduline.ui.tests;

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
}
