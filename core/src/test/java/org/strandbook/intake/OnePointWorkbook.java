package org.strandbook.intake;

import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;

import org.strandbook.site.Analyzer;
import org.strandbook.site.DetectorType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.Workbook;

/** An invented workbook with one point, P-1, to import scans into. */
final class OnePointWorkbook {

    private OnePointWorkbook() {
    }

    static Workbook create(Path file, String siteName) {
        Workbook wb = Workbook.create(file, new Site(siteName), "tester");
        wb.site().addAnalyzer(new Analyzer("AZ", "", 1000, 2500, 1, 20, DetectorType.EXTENDED_INGAAS));
        wb.catalog().addProbeType(new ProbeType("PT", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 2, 1, 1));
        wb.points().add(new MeasurementPoint("P-1", "", "", "AZ", 1, "PT", List.of(new WavelengthBand("b", 1500, 1600)),
                OptionalDouble.empty(), false, false, OptionalDouble.empty()));
        return wb;
    }
}
