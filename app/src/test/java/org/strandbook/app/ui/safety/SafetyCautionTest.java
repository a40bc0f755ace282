package org.strandbook.app.ui.safety;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SafetyCautionTest {

    @Test
    void cautionIsNeededUntilAcknowledgedOnce() {
        SafetyCaution caution = new SafetyCaution();
        assertTrue(caution.needed());
        caution.acknowledge();
        assertFalse(caution.needed());
    }

    @Test
    void cautionNamesTheStandardsForLightSourcesAndExplosiveAtmospheres() {
        // IEC 60825-1/-2 (laser and fiber-system safety), IEC 62471 (lamps), IEC 60079-28 (optical
        // radiation in explosive atmospheres)
        for (String standard : new String[] {"IEC 60825-1", "IEC 60825-2", "IEC 62471", "IEC 60079-28"}) {
            assertTrue(SafetyCaution.TEXT.contains(standard), standard);
        }
        assertTrue(SafetyCaution.TEXT.contains("Never look into a live fiber end"));
        assertTrue(SafetyCaution.TEXT.contains("permit-to-work and licensed practice"));
    }
}
