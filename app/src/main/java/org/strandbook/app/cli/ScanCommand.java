package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.math.BigDecimal;
import java.util.concurrent.Callable;

import org.strandbook.site.Spectrum;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook scan SITE ID}: one stored spectrum as CSV, a header {@code wavelength_nm,value}
 * then one line per point in ascending wavelength, dot decimals. Each number is the shortest decimal
 * that reads back to the stored double, so nothing is lost on the way to a spreadsheet.
 */
@Command(name = "scan", mixinStandardHelpOptions = true,
        description = "Print one stored spectrum as CSV lines wavelength_nm,value.")
final class ScanCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Parameters(index = "1", paramLabel = "ID", description = "The scan's id, as 'strandbook scans' lists it.")
    long id;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Spectrum spectrum;
        try (Workbook wb = workbook.openForReading()) {
            spectrum = wb.scans().spectrum(id);
        }
        double[] wavelengthsNm = spectrum.wavelengthsNm();
        double[] values = spectrum.values();
        StringBuilder csv = new StringBuilder(32 * values.length).append("wavelength_nm,value\n");
        for (int i = 0; i < values.length; i++) {
            csv.append(plain(wavelengthsNm[i])).append(',').append(plain(values[i])).append('\n');
        }
        PrintWriter out = spec.commandLine().getOut();
        out.print(csv);
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }

    /** Shortest round-trip decimal without exponent: 1550, 0.00001, -12.25. */
    static String plain(double v) {
        if (v == 0) {
            return "0";
        }
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
