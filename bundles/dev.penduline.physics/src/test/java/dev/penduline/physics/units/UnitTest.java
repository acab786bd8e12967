package dev.penduline.physics.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Conversion factors against NIST Special Publication 811 (2008), Appendix B.8/B.9 "Factors for
 * units listed alphabetically / by kind of quantity" (seven-digit values from memory; the inch,
 * foot and pound are exact by the 1959 international yard and pound agreement).
 */
class UnitTest {

    @Test
    void lengthsAreExact() {
        // NIST SP 811 B.8: inch = 2.54 E−02 m exactly, foot = 3.048 E−01 m exactly.
        assertEquals(0.0254, Unit.INCH_UNIT.toSi(1), 0);
        assertEquals(0.3048, Unit.FOOT_UNIT.toSi(1), 0);
        assertEquals(0.025, Unit.MILLIMETRE.toSi(25), 1e-18);
        assertEquals(12, Unit.convert(1, Unit.FOOT_UNIT, Unit.INCH_UNIT), 1e-14);
        assertEquals(2.54, Unit.convert(1, Unit.INCH_UNIT, Unit.CENTIMETRE), 1e-14);
    }

    @Test
    void poundIsExact() {
        // NIST SP 811 B.8: pound (avoirdupois) = 4.535 924 E−01 kg (exactly 0.45359237 kg).
        assertEquals(0.45359237, Unit.POUND_MASS.toSi(1), 0);
        assertEquals(0.4535924, Unit.POUND_MASS.toSi(1), 5e-8);
        assertEquals(0.25, Unit.GRAM.toSi(250), 1e-16);
    }

    @Test
    void inertiasMatchTheTable() {
        // NIST SP 811 B.8: pound square inch = 2.926 397 E−04 kg·m²,
        // pound square foot = 4.214 011 E−02 kg·m². Products of exact factors:
        // 0.45359237 × 0.0254² = 2.92639653429e−4; 0.45359237 × 0.3048² = 4.21401100938048e−2.
        assertEquals(2.926397e-4, Unit.LB_IN2.toSi(1), 5e-11);
        assertEquals(4.214011e-2, Unit.LB_FT2.toSi(1), 5e-9);
        assertEquals(2.92639653429e-4, Unit.LB_IN2.toSi(1), 1e-15);
        assertEquals(4.21401100938048e-2, Unit.LB_FT2.toSi(1), 1e-17);
        // SI prefixes (BIPM SI Brochure): g·mm² = 1e−3 × 1e−6, g·cm² = 1e−3 × 1e−4, kg·mm² = 1e−6.
        assertEquals(1e-9, Unit.G_MM2.toSi(1), 0);
        assertEquals(1e-7, Unit.G_CM2.toSi(1), 0);
        assertEquals(1e-6, Unit.KG_MM2.toSi(1), 0);
        assertEquals(1.2e-3, Unit.G_MM2.toSi(1.2e6), 1e-18);
    }

    @Test
    void anglesTimesAndRates() {
        // NIST SP 811 B.8: degree = 1.745 329 E−02 rad.
        assertEquals(1.745329e-2, Unit.DEGREE.toSi(1), 5e-9);
        assertEquals(Math.PI, Unit.DEGREE.toSi(180), 1e-15);
        assertEquals(90, Unit.RADIAN.fromSi(Math.PI / 2) * 180 / Math.PI, 1e-13);
        assertEquals(1.745329e-2, Unit.DEG_PER_S.toSi(1), 5e-9);
        assertEquals(0.0125, Unit.MILLISECOND.toSi(12.5), 1e-18);
        assertEquals(2.5e-5, Unit.MICROSECOND.toSi(25), 1e-20);
        assertEquals(0.3, Unit.NEWTON_MILLIMETRE.toSi(300), 1e-15);
        assertEquals(7850, Unit.G_PER_CM3.toSi(7.85), 1e-9);
    }

    @Test
    void encoderCountsNeedTheirResolution() {
        // A 1024-line encoder read in quadrature gives 4096 counts per turn; 1024 counts are a
        // quarter turn, π/2 rad (definition of the radian).
        final Unit counts = Unit.encoderCounts(4096);
        assertEquals(Math.PI / 2, counts.toSi(1024), 1e-15);
        assertEquals(1024, counts.fromSi(Math.PI / 2), 1e-12);
        assertTrue(assertThrows(IllegalStateException.class, () -> Unit.ENCODER_COUNT.toSi(1))
                .getMessage().contains("counts per revolution"));
        assertThrows(IllegalArgumentException.class, () -> Unit.encoderCounts(0));
    }

    @Test
    void differentQuantitiesDoNotConvert() {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Unit.convert(1, Unit.GRAM, Unit.MILLIMETRE));
        assertTrue(e.getMessage().contains("mass") && e.getMessage().contains("length"), e.getMessage());
    }

    @Test
    void everyQuantityHasItsSiUnit() {
        for (Quantity q : Quantity.values()) {
            assertEquals(1, Unit.si(q).siPerUnit(), 0, q.name());
            assertEquals(q.siSymbol(), Unit.si(q).symbol(), q.name());
        }
    }

    @Test
    void everySuffixIsUnique() {
        assertEquals(Unit.all().size(), Unit.all().stream().map(Unit::suffix).distinct().count());
    }
}
