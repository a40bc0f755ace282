package org.strandbook.dossier;

import java.util.stream.Collectors;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;

/** The point register: one row per measurement point. */
final class PointRegisterRows {

    private PointRegisterRows() {
    }

    static void fill(TableSheet t, DossierContent content) {
        for (DossierPoint p : content.points()) {
            MeasurementPoint m = p.point();
            Row r = t.newRowStyled();
            t.text(r, DossierColumn.POINT_TAG, m.tag());
            t.text(r, DossierColumn.POINT_SERVICE, m.service());
            t.text(r, DossierColumn.POINT_LOCATION, m.location());
            t.text(r, DossierColumn.POINT_ANALYZER, m.analyzerTag());
            t.number(r, DossierColumn.POINT_CHANNEL, m.channel());
            t.text(r, DossierColumn.POINT_PROBE_TYPE, m.probeTypeCode());
            t.text(r, DossierColumn.POINT_PROBE_KIND, content.catalog().probeTypes().containsKey(m.probeTypeCode())
                    ? DossierText.words(content.catalog().probe(m.probeTypeCode()).kind()) : "");
            t.text(r, DossierColumn.POINT_BANDS, m.bands().stream()
                    .map(b -> b.name() + ": " + DossierText.decimal(b.fromNm(), 0) + "–" + DossierText.decimal(b.toNm(), 0))
                    .collect(Collectors.joining("\n")));
            t.number(r, DossierColumn.POINT_TOLERANCE_DB, m.effectiveToleranceDb(content.site()));
            t.text(r, DossierColumn.POINT_HAZARDOUS, m.hazardousArea() ? "YES" : "NO");
            t.text(r, DossierColumn.POINT_HYDROGEN, m.hydrogenService() ? "YES" : "NO");
            m.processTemperatureC().ifPresent(c -> t.number(r, DossierColumn.POINT_PROCESS_C, c));
            for (PathLeg leg : p.legs()) {
                t.number(r, leg.direction() == PathDirection.SEND ? DossierColumn.POINT_SEND_M
                        : DossierColumn.POINT_RETURN_M, leg.totalLengthM());
            }
            t.text(r, DossierColumn.POINT_STATUS, p.status().label());
            t.text(r, DossierColumn.POINT_SIGN_OFFS, p.signOffs().stream()
                    .map(s -> s.role().name() + " " + s.name() + " " + DossierText.date(s.signedAt())
                            + (s.remark().isEmpty() ? "" : " \u2014 " + s.remark()))
                    .collect(Collectors.joining("\n")));
        }
    }
}
