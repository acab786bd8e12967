package dev.penduline.physics.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Reading the unit out of a column name. */
class SuffixedNameTest {

    private static void assertSplit(String column, String base, Unit unit) {
        final SuffixedName s = SuffixedName.parse(column).orElseThrow(() -> new AssertionError(column));
        assertEquals(base, s.base(), column);
        assertEquals(unit, s.unit(), column);
    }

    @Test
    void commonColumnNames() {
        assertSplit("mass_g", "mass", Unit.GRAM);
        assertSplit("length_mm", "length", Unit.MILLIMETRE);
        assertSplit("ixx_g_mm2", "ixx", Unit.G_MM2);
        assertSplit("ixx_kg_mm2", "ixx", Unit.KG_MM2);
        assertSplit("Ixx_KG_M2", "ixx", Unit.KG_M2);
        assertSplit("time_ms", "time", Unit.MILLISECOND);
        assertSplit("time_us", "time", Unit.MICROSECOND);
        assertSplit("angle_deg", "angle", Unit.DEGREE);
        assertSplit("inner_radius_in", "inner_radius", Unit.INCH_UNIT);
        assertSplit("mass_tol_lb", "mass_tol", Unit.POUND_MASS);
        assertSplit("torque_n_m", "torque", Unit.NEWTON_METRE);
        assertSplit("density_g_cm3", "density", Unit.G_PER_CM3);
    }

    @Test
    void longestSuffixWins() {
        // "rate_deg_s" is a rate in °/s, not "rate_deg" in seconds.
        assertSplit("rate_deg_s", "rate", Unit.DEG_PER_S);
        assertSplit("omega_rad_s", "omega", Unit.RAD_PER_S);
    }

    @Test
    void namesWithoutAUnit() {
        assertTrue(SuffixedName.parse("name").isEmpty());
        assertTrue(SuffixedName.parse("shape").isEmpty());
        assertTrue(SuffixedName.parse("_mm").isEmpty());
        assertTrue(SuffixedName.parse("length_furlong").isEmpty());
    }

    @Test
    void encoderCountsTakeTheirResolutionLater() {
        final SuffixedName s = SuffixedName.parse("angle_counts").orElseThrow();
        assertEquals(Unit.ENCODER_COUNT, s.unit());
        assertEquals(Math.PI, s.withCountsPerRevolution(2000).unit().toSi(1000), 1e-15);
        assertEquals("angle_rad", s.nameIn(Unit.RADIAN));
    }
}
