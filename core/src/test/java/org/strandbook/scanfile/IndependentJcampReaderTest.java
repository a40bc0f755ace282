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

    @Test
    void aFileWhoseLinesAreLabelledOnePointEarlyIsReadOnItsDeclaredAxis() throws Exception {
        // The layout of the NIST Quantitative Infrared Database files, e.g. acetone.jdx as kept in the
        // public repository nzhagen/jcamp (data/infrared_spectra/acetone.jdx): ##FIRSTX=574.928,
        // ##LASTX=3975.077, ##NPOINTS=14106, six ordinates a line, lines labelled 574.93, 576.13, 577.58,
        // 579.03, 580.47 ... — from the second line on, the abscissa of the point before the line's first
        // ordinate. The layout is rebuilt here with invented ordinates. The reference library refuses
        // such files ("x check failed"); readers that build the axis from FIRSTX, LASTX and NPOINTS
        // take them, and so do we: point i at FIRSTX + i (LASTX - FIRSTX)/(NPOINTS - 1), McDonald &
        // Wilks 1988, with every ordinate in file order.
        double firstX = 574.928;
        double lastX = 3975.077;
        int n = 14106;
        double dx = (lastX - firstX) / (n - 1);
        Random random = new Random(21);
        StringBuilder text = new StringBuilder("##TITLE=layout of a gas-phase reference spectrum\n##JCAMP-DX=4.24\n"
                + "##DATA TYPE=INFRARED SPECTRUM\n##XUNITS=cm-1\n##YUNITS=ARBITRARY UNITS\n##XFACTOR=1.0\n"
                + "##YFACTOR=1\n##DELTAX=0.2410\n##FIRSTX=574.928\n##LASTX=3975.077\n##NPOINTS=14106\n"
                + "##XYDATA=(X++(Y..Y))\n");
        String[] labels = new String[5];
        double[] ordinates = new double[n];
        for (int start = 0, line = 0; start < n; start += 6, line++) {
            double label = firstX + (start == 0 ? 0 : start - 1) * dx;
            String printed = String.format(java.util.Locale.ROOT, "%.2f", label);
            if (line < labels.length) {
                labels[line] = printed;
            }
            text.append(printed);
            for (int i = start; i < Math.min(n, start + 6); i++) {
                ordinates[i] = 100000 + random.nextInt(900000);
                text.append(' ').append((long) ordinates[i]);
            }
            text.append('\n');
        }
        text.append("##END=\n");
        assertEquals(java.util.List.of("574.93", "576.13", "577.58", "579.03", "580.47"), java.util.List.of(labels),
                "the rebuilt labels are the file's");
        SpectrumFile ours = SpectrumFiles.read("layout.jdx", text.toString().getBytes(StandardCharsets.UTF_8));
        assertEquals(1, ours.tolerated().size(), ours.tolerated().toString());
        double[] x = ours.xInFileUnit();
        double[] y = ours.values();
        for (int i = 0; i < n; i++) {
            int j = n - 1 - i; // a descending wavenumber axis is held as ascending wavelength
            assertEquals(firstX + i * dx, x[j], 1e-9 * lastX, "abscissa of point " + i);
            assertEquals(ordinates[i], y[j], "ordinate of point " + i);
        }
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
