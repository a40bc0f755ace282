package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.Random;

import org.jcamp.parser.JCAMPReader;
import org.jcamp.spectrum.Spectrum1D;
import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;

/**
 * Compares Strandbook's reader with an independent general-purpose JCAMP-DX library: the jcamp-dx
 * reference implementation (Weber, Kuhn, Reutemann; Maven Central com.googlecode.jcamp-dx:jcamp-dx
 * 0.9.2, used here as a test oracle only).
 */
class IndependentJcampReaderTest {

    private static final double RELATIVE_TOLERANCE = 1e-9;

    @Test
    void dupdec1AgreesPointForPointWithTheReferenceLibrary() throws Exception {
        // public-domain test file dupdec1.jdx (repository nzhagen/jcamp,
        // data/Robert_J_Lancashire_test_data/dupdec1.jdx), DIFDUP with Y-value checks
        String text = new String(JcampDxReaderTest.resource("dupdec1.jdx"), StandardCharsets.UTF_8);
        SpectrumFile ours = SpectrumFiles.read("dupdec1.jdx", text.getBytes(StandardCharsets.UTF_8));
        // the reference library turns TRANSMITTANCE into absorbance; relabelled it keeps the raw ordinates
        Spectrum1D reference = reference(text.replace("##YUNITS= TRANSMITTANCE", "##YUNITS= ARBITRARY UNITS"));
        assertSamePoints(ours, reference);
    }

    @Test
    void ourDifDupFileAgreesWithTheReferenceLibrary() throws Exception {
        SpectrumFile written = SpectrumFile.inMemory("reference lamp scan", XUnit.NM, "COUNTS",
                WavelengthGrid.uniformNm(900, 1700, 2001).wavelengthsNm(), lampLikeValues(2001, 11), Map.of());
        String text = JcampDxWriter.difDup().toText(written);
        SpectrumFile ours = SpectrumFiles.read("lamp.jdx", text.getBytes(StandardCharsets.UTF_8));
        assertSamePoints(ours, reference(text.replace("##YUNITS= COUNTS", "##YUNITS= ARBITRARY UNITS")));
    }

    @Test
    void ourAffnFileAgreesWithTheReferenceLibrary() throws Exception {
        SpectrumFile written = SpectrumFile.inMemory("dark scan", XUnit.NM, "COUNTS",
                WavelengthGrid.uniformNm(400, 1000, 601).wavelengthsNm(), lampLikeValues(601, 12), Map.of());
        String text = JcampDxWriter.affn().toText(written);
        SpectrumFile ours = SpectrumFiles.read("dark.jdx", text.getBytes(StandardCharsets.UTF_8));
        assertSamePoints(ours, reference(text.replace("##YUNITS= COUNTS", "##YUNITS= ARBITRARY UNITS")));
    }

    private static Spectrum1D reference(String text) throws Exception {
        return (Spectrum1D) JCAMPReader.getInstance().createSpectrum(text);
    }

    /** Same points, whatever order each reader keeps them in. */
    private static void assertSamePoints(SpectrumFile ours, Spectrum1D reference) {
        double[] refX = reference.getXData().toArray();
        double[] refY = reference.getYData().toArray();
        double[] ourX = ours.xInFileUnit();
        double[] ourY = ours.values();
        assertEquals(refX.length, ourX.length, "point count");
        boolean sameOrder = (refX[refX.length - 1] - refX[0]) * (ourX[ourX.length - 1] - ourX[0]) > 0;
        for (int i = 0; i < refX.length; i++) {
            int j = sameOrder ? i : refX.length - 1 - i;
            assertEquals(refX[i], ourX[j], Math.abs(refX[i]) * RELATIVE_TOLERANCE, "abscissa of point " + i);
            assertEquals(refY[i], ourY[j], Math.max(Math.abs(refY[i]) * RELATIVE_TOLERANCE, 1e-12),
                    "ordinate of point " + i);
        }
    }

    /** Invented demo values: a smooth lamp curve with seeded noise. */
    private static double[] lampLikeValues(int n, long seed) {
        Random random = new Random(seed);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = (double) i / (n - 1);
            y[i] = 30000 * Math.exp(-Math.pow((t - 0.4) / 0.3, 2)) + 200 + 15 * random.nextGaussian();
        }
        return y;
    }
}
