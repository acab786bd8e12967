package dev.penduline.cli.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

class PrintableWriterTest {

    @Test
    void controlCharactersBecomeVisibleEscapesAndLineFeedsAndTabsStay() {
        StringWriter target = new StringWriter();
        try (PrintWriter w = new PrintWriter(new PrintableWriter(target))) {
            w.print("part\u001b[31mred\u0007\tok\nnext\u0085\u007f");
        }
        assertEquals("part\\u001b[31mred\\u0007\tok\nnext\\u0085\\u007f", target.toString());
    }

    @Test
    void plainTextIsPassedOnUnchanged() {
        String text = "J0 = 0.0308 kg·m² ± 2 %, θ0 = 20.0°";
        assertEquals(text, PrintableWriter.printable(text));
    }
}
