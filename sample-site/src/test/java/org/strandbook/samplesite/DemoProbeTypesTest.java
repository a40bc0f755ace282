package org.strandbook.samplesite;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.strandbook.site.ProbeType;

class DemoProbeTypesTest {

    @Test
    void everyDemoProbeCountsTwoFacesForEachWindowCrossing() {
        // a window crossed once is 2 faces, crossed out and back 4 (the definition in ProbeWindow and
        // ProbeType): a transmission probe crosses two windows once each, a transflectance or diffuse
        // reflectance probe crosses its one window out and back
        for (ProbeType probe : new DemoPlant().probeTypes()) {
            int crossings = switch (probe.kind()) {
                case TRANSMISSION -> 2; // two windows, each once
                case TRANSFLECTANCE, DIFFUSE_REFLECTANCE -> 2; // one window, out and back
                default -> throw new AssertionError("no crossing rule for " + probe.kind());
            };
            assertEquals(2 * crossings, probe.windowFaces(), probe.code() + " (" + probe.kind() + ")");
        }
    }
}
