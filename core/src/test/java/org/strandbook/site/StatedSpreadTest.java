package org.strandbook.site;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/** A spread is read as a technician writes it and refused, with an example, when it is not one. */
class StatedSpreadTest {

    @Test
    void plusMinusIsAHalfWidthAndReadsBackAsWritten() {
        // design choice: "±a unit" is the rectangular half-width, the form datasheets print
        StatedSpread s = StatedSpread.parse("+/- 0.30 db", SpreadInput.CONNECTOR_LOSS);
        assertEquals(StatedSpread.plusMinus(0.3, "dB"), s);
        assertEquals("±0.3 dB", s.toString());
    }

    @Test
    void uIsAStandardUncertainty() {
        // JCGM 100:2008, 2.3.1: u denotes a standard uncertainty; design choice to read "u 0.05 dB" so
        StatedSpread s = StatedSpread.parse("u=0,05 dB", SpreadInput.JOINT_LOSS);
        assertTrue(s.normal());
        assertEquals("u 0.05 dB", s.toString());
    }

    @Test
    void aRangeIsRefusedWhereTheInputHasNoRange() {
        // design choice: only OH content is stated as a range of the value itself
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StatedSpread.parse("0.5..1.5 dB", SpreadInput.CONNECTOR_LOSS));
        assertTrue(e.getMessage().contains("±0.3 dB"), e.getMessage());
    }

    @Test
    void aUnitTheInputDoesNotTakeIsRefusedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StatedSpread.parse("±3 m", SpreadInput.CONNECTOR_LOSS));
        assertTrue(e.getMessage().contains("unit 'm'"), e.getMessage());
    }

    @Test
    void anOhRangeMustHoldTheGradesValue() {
        // design choice: a range that excludes the entered value contradicts it; refuse rather than guess
        StatedSpreads range = new StatedSpreads(Map.of(SpreadInput.OH_CONTENT,
                StatedSpread.parse("5..40 ppm", SpreadInput.OH_CONTENT)), "");
        assertThrows(IllegalArgumentException.class, () -> new FiberType("F", "", 200, 220, 245, 0.22, "FUSED_SILICA",
                OhGrade.LOW_OH, 60, List.of(), range));
    }

    @Test
    void aCatalogRowTakesOnlyItsOwnInputs() {
        StatedSpreads length = new StatedSpreads(Map.of(SpreadInput.LENGTH,
                StatedSpread.parse("±1 m", SpreadInput.LENGTH)), "");
        assertThrows(IllegalArgumentException.class,
                () -> new ConnectorType("C", "", "SMA 905", 1.0, true, length));
    }
}
