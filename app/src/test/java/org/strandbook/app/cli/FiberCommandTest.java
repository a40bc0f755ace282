package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FiberCommandTest {

    private static final String[] EXAMPLE = {"fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22",
        "--oh-ppm", "5", "--length-m", "30", "--wavelengths-nm", "1000,1383,2350", "--json"};

    private static final List<String> FIELDS = List.of("wavelength_nm", "attenuation_db_per_km", "fiber_loss_db",
            "fresnel_loss_db_per_face", "bend_loss_db", "total_loss_db", "transmittance");

    @Test
    void jsonHasEveryFieldForEveryWavelength() {
        // the output contract of `strandbook fiber --json`
        CliRun run = CliRun.of(EXAMPLE);
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().startsWith("{\"points\":[{"), run.out());
        for (String field : FIELDS) {
            assertEquals(3, values(run.out(), field).size(), field);
        }
        assertEquals(List.of(1000.0, 1383.0, 2350.0), values(run.out(), "wavelength_nm"));
    }

    @Test
    void totalIsTwoFacesPlusFiberPlusBendAndTransmittanceFollowsFromIt() {
        // one pass = entry face + fiber + exit face + bend; T = 10^(−L/10) (definition of the decibel)
        CliRun run = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--oh-ppm", "5",
                "--length-m", "30", "--bend-radius-mm", "60", "--bend-count", "2", "--wavelengths-nm", "850,1300", "--json");
        assertEquals(0, run.exitCode(), run.err());
        for (int i = 0; i < 2; i++) {
            double face = values(run.out(), "fresnel_loss_db_per_face").get(i);
            double fiber = values(run.out(), "fiber_loss_db").get(i);
            double bend = values(run.out(), "bend_loss_db").get(i);
            double total = values(run.out(), "total_loss_db").get(i);
            assertTrue(bend > 0);
            assertEquals(2 * face + fiber + bend, total, 1e-8);
            assertEquals(Math.pow(10, -total / 10), values(run.out(), "transmittance").get(i), 1e-9);
            assertEquals(values(run.out(), "attenuation_db_per_km").get(i) * 30 / 1000, fiber, 1e-8);
        }
    }

    @Test
    void silicaFaceLossIsAboutOneAndAHalfTenthsOfADecibel() {
        // R ≈ 3.38 % at 1000 nm (Malitson 1965 index, Fresnel) → −10·log10(1 − R) ≈ 0.149 dB
        CliRun run = CliRun.of(EXAMPLE);
        assertEquals(0.149, values(run.out(), "fresnel_loss_db_per_face").get(0), 0.001);
    }

    @Test
    void infraredEdgeMakesThirtyMetresCostTensOfDecibelsAt2350() {
        // ~1 dB/m near 2350 nm (common practice): 30 m → on the order of 30 dB
        CliRun run = CliRun.of(EXAMPLE);
        double fiber = values(run.out(), "fiber_loss_db").get(2);
        assertTrue(fiber > 10 && fiber < 90, "fiber loss " + fiber);
    }

    @Test
    void wetFiberShowsNoUsableWindowPastTwoPointTwoMicronsAtOneMetre() {
        // high-OH silica is unusable from 2.2 µm up to the 2.72 µm fundamental (common practice)
        CliRun run = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--oh-ppm", "800",
                "--length-m", "1", "--wavelengths-nm", "2300,2400");
        assertEquals(0, run.exitCode(), run.err());
        String line = run.out().lines().filter(l -> l.startsWith("Usable windows")).findFirst().orElseThrow();
        Matcher m = Pattern.compile("(\\d+)–(\\d+) nm").matcher(line.substring(line.indexOf("):")));
        int windows = 0;
        while (m.find()) {
            windows++;
            assertTrue(Integer.parseInt(m.group(2)) < 2200, line);
        }
        assertTrue(windows > 0, "the visible and short NIR stay usable at 1 m: " + line);
    }

    @Test
    void wavenumbersGiveTheSameResultAsTheirWavelengths() {
        // 10000 cm-1 = 1000 nm (ISO 80000-7)
        CliRun nm = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--length-m", "30",
                "--wavelengths-nm", "1000", "--json");
        CliRun cm = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--length-m", "30",
                "--wavenumbers-cm", "10000", "--json");
        assertEquals(values(nm.out(), "total_loss_db").get(0), values(cm.out(), "total_loss_db").get(0), 1e-9);
    }

    @Test
    void tableShowsUnitsAndTheUsableWindows() {
        // a technician reads units in every header and the windows for the stated allowance
        CliRun run = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--oh-ppm", "5",
                "--length-m", "30", "--wavelengths-nm", "1000,1383,2350");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("(nm)") && run.out().contains("(dB/km)") && run.out().contains("(dB)"), run.out());
        assertTrue(run.out().contains("Usable windows (total ≤ 3 dB, 1 nm grid over 400-2500 nm): "), run.out());
        // the 1383 nm OH band at 5 ppm costs ~9 dB over 30 m, so it splits the windows around it
        assertTrue(run.out().matches("(?s).*\\d+–13\\d\\d nm, 1[34]\\d\\d–\\d+ nm.*"), run.out());
    }

    // Bad input: one line on stderr, exit status 2, never a stack trace (Strandbook CLI rules).
    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            --length-m|-3
            --na|1.0
            --na|0
            --na|abc
            --core-um|-200
            --clad-um|150
            --oh-ppm|-1
            --allowed-loss-db|-1
            --bend-radius-mm|0
            --length-m|NaN
            --wavelengths-nm|3500
            --wavelengths-nm|1000,x
            --wavelengths-nm|150
            --frobnicate|1
            """)
    void badInputExitsWithUsageStatusAndOneLineWithoutStackTrace(String option, String value) {
        List<String> args = new ArrayList<>(List.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22",
                "--length-m", "30", "--wavelengths-nm", "1000"));
        int at = args.indexOf(option);
        if (at >= 0) {
            args.set(at + 1, value);
        } else {
            args.add(option);
            args.add(value);
        }
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(2, run.exitCode(), run.err());
        assertTrue(run.err().startsWith("strandbook: "), run.err());
        assertFalse(run.err().contains("Exception") || run.err().contains("\tat "), run.err());
        assertTrue(run.err().lines().count() <= 2, run.err());
        assertEquals("", run.out());
    }

    @Test
    void wavelengthsAndWavenumbersTogetherAreWrongUsage() {
        // the two axes exclude each other
        CliRun run = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--length-m", "30",
                "--wavelengths-nm", "1000", "--wavenumbers-cm", "10000");
        assertEquals(2, run.exitCode());
    }

    /** A straight, OH-free fiber: its only spreads are the shipped length and attenuation rectangles. */
    private static final String[] STRAIGHT_DRY = {"fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22",
        "--oh-ppm", "0", "--length-m", "30", "--wavelengths-nm", "2300", "--json"};

    private static CliRun chance(String[] base, double withinDb) {
        List<String> args = new ArrayList<>(List.of(base));
        args.addAll(List.of("--chance-within-db", Double.toString(withinDb)));
        return CliRun.of(args.toArray(String[]::new));
    }

    @Test
    void chanceFollowsTheTrapezoidOfTwoRectangularSpreads() {
        // Design choice (the shipped spreads): length ±2 % and attenuation ±15 %, both rectangular, both
        // linear in the fiber's loss L_f, so the total is the prediction plus the sum of two rectangles of
        // half-widths a = 0.15·L_f and b = 0.02·L_f. Their sum has the trapezoidal distribution function
        // F(s) = 1/2 + s/(2a) for |s| ≤ a − b and 1 − (a + b − s)²/(8ab) above (the convolution of two
        // uniform densities; Bradley & Gupta, Ann. Inst. Statist. Math. 54 (2002) 689–700, n = 2).
        CliRun plain = CliRun.of(STRAIGHT_DRY);
        double total = values(plain.out(), "total_loss_db").get(0);
        double fiber = values(plain.out(), "fiber_loss_db").get(0);
        double a = 0.15 * fiber;
        double b = 0.02 * fiber;
        double inside = 0.5 * (a - b);
        double tail = a;
        CliRun atPrediction = chance(STRAIGHT_DRY, total);
        assertEquals(0, atPrediction.exitCode(), atPrediction.err());
        // Design choice: 0.005, over four binomial standard errors at M = 2·10⁵.
        assertEquals(0.5, values(atPrediction.out(), "probability").get(0), 0.005);
        assertEquals(0.5 + inside / (2 * a), values(chance(STRAIGHT_DRY, total + inside).out(), "probability").get(0),
                0.005);
        assertEquals(1 - Math.pow(a + b - tail, 2) / (8 * a * b),
                values(chance(STRAIGHT_DRY, total + tail).out(), "probability").get(0), 0.005);
        assertEquals(total, values(atPrediction.out(), "predicted_loss_db").get(0), 1e-9);
        assertEquals(List.of(2300.0), values(atPrediction.out(), "at_nm"));
    }

    @Test
    void aStatedAttenuationSpreadReplacesTheShippedOne() {
        // As above with a = 0.05·L_f from --attenuation-spread ±5%, b = 0.02·L_f still; at s = a (above
        // a − b) the trapezoid gives F = 1 − b/(8a) (Bradley & Gupta, Ann. Inst. Statist. Math. 54 (2002)
        // 689–700, n = 2).
        CliRun plain = CliRun.of(STRAIGHT_DRY);
        double total = values(plain.out(), "total_loss_db").get(0);
        double fiber = values(plain.out(), "fiber_loss_db").get(0);
        double a = 0.05 * fiber;
        double b = 0.02 * fiber;
        List<String> args = new ArrayList<>(List.of(STRAIGHT_DRY));
        args.addAll(List.of("--attenuation-spread", "+/-5%", "--chance-within-db", Double.toString(total + a)));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        // Design choice: 0.005, over four binomial standard errors at M = 2·10⁵.
        assertEquals(1 - b / (8 * a), values(run.out(), "probability").get(0), 0.005);
    }

    @Test
    void aLengthSpreadInDecibelsIsWrongUsage() {
        CliRun run = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--length-m", "2",
                "--wavelengths-nm", "1000", "--chance-within-db", "5", "--length-spread", "+/-1dB");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("--length-spread: length spread '+/-1dB': unit 'dB' is not one of m, %"),
                run.err());
    }

    @Test
    void chanceIsPrintedAsAPercentageAtTheStatedWavelength() {
        // the output contract of the design question in the table form
        CliRun run = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--length-m", "2",
                "--wavelengths-nm", "1000", "--chance-within-db", "5", "--chance-at-nm", "1550");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("chance the loop stays within 5 dB at 1550 nm: 100.0 %"), run.out());
    }

    @Test
    void chanceWavelengthWithoutAnAllowedLossIsRefused() {
        // a design question needs its limit; never a silent default
        CliRun run = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--length-m", "2",
                "--wavelengths-nm", "1000", "--chance-at-nm", "2300");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("--chance-at-nm needs --chance-within-db"), run.err());
    }

    private static List<Double> values(String json, String field) {
        Matcher m = Pattern.compile("\"" + field + "\":(-?[0-9.]+(?:[eE][-+]?[0-9]+)?)").matcher(json);
        List<Double> out = new ArrayList<>();
        while (m.find()) {
            out.add(Double.parseDouble(m.group(1)));
        }
        return out;
    }
}
