package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Instant;

import org.junit.jupiter.api.Test;

/** A conflict's values keep the unit their field's name carries (design choice: units shown everywhere). */
class FieldUnitTest {

    private static SyncLedger.Conflict conflict(String field, String mine, String theirs) {
        return new SyncLedger.Conflict(1, PortableTable.PATH_ELEMENT, "AT-4101/SEND/4", field, mine, theirs, "t_quill",
                Instant.EPOCH, null, null, null);
    }

    @Test
    void aJointLossReadsInDecibels() {
        assertEquals("0.5 dB", conflict("loss_db", "0.5", "0.3").shown("0.5"));
    }

    @Test
    void anAttenuationReadsPerKilometreNotAsAKilometre() {
        assertEquals("dB/km", FieldUnit.of("attenuation_db_per_km"));
    }

    @Test
    void aCoreDiameterReadsInMicrometresAndATemperatureInDegreesCelsius() {
        assertEquals("\u00B5m", FieldUnit.of("core_um"));
        assertEquals("\u00B0C", FieldUnit.of("process_temperature_c"));
    }

    @Test
    void textHasNoUnitAndAMissingValueOrRecordSaysSo() {
        assertEquals("LOH-200", conflict("fiber_code", "\"LOH-200\"", "null").shown("\"LOH-200\""));
        assertEquals("(empty)", conflict("loss_db", "null", "0.3").shown("null"));
        assertEquals("(removed)", conflict(SyncLedger.WHOLE_RECORD, "null", "{}").shown("null"));
    }
}
