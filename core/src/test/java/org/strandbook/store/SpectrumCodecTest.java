package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.HexFormat;

import org.junit.jupiter.api.Test;
import org.strandbook.site.Spectrum;

class SpectrumCodecTest {

    @Test
    void storesWavelengthsThenValuesAsLittleEndianBinary64() {
        // IEEE 754-2019, binary64: 1.0 = 0x3FF0000000000000, 2.0 = 0x4000000000000000,
        // 1550.0 = 0x4098380000000000, -0.5 = 0xBFE0000000000000; little-endian puts the low byte first.
        Spectrum s = new Spectrum(new double[] {1.0, 1550.0}, new double[] {2.0, -0.5});
        String hex = HexFormat.of().formatHex(SpectrumCodec.encode(s));
        assertEquals("000000000000f03f" + "0000000000389840" + "0000000000000040" + "000000000000e0bf", hex);
    }

    @Test
    void roundTripKeepsEveryBit() {
        Spectrum s = DemoSite.spectrum(1024, 7);
        Spectrum back = SpectrumCodec.decode(SpectrumCodec.encode(s), s.size(), 1);
        assertArrayEquals(s.wavelengthsNm(), back.wavelengthsNm());
        assertArrayEquals(s.values(), back.values());
    }

    @Test
    void refusesBytesThatDoNotMatchThePointCount() {
        byte[] data = SpectrumCodec.encode(DemoSite.spectrum(16, 1));
        WorkbookException e = assertThrows(WorkbookException.class,
                () -> SpectrumCodec.decode(Arrays.copyOf(data, data.length - 8), 16, 42));
        assertTrue(e.getMessage().startsWith("scan 42: stored spectrum is damaged"), e.getMessage());
    }
}
