package org.strandbook.app.ui.workbook;

import java.util.List;

import org.strandbook.site.Analyzer;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.CableSegment;
import org.strandbook.site.FiberType;
import org.strandbook.site.Joint;
import org.strandbook.site.MeasurementPoint;

/**
 * The window's interim loss estimate until the optics engine is plugged in: fiber attenuation
 * interpolated linearly between datasheet points (held flat beyond the ends) times length, plus
 * each joint's entered or typical loss, plus the probe's fixed loss. Bend, Fresnel and OH terms
 * are not included; {@link PointBudget#basis()} says so on screen.
 */
public final class DatasheetLossBudget {

    static final String BASIS = "datasheet attenuation \u00D7 length + joints + probe; bends and window faces not yet included";
    private static final int PLOT_POINTS = 241;

    private final Catalog catalog;

    public DatasheetLossBudget(Catalog catalog) {
        this.catalog = catalog;
    }

    /** Attenuation of {@code fiber} at {@code wavelengthNm}, dB/km. */
    public static double attenuationDbPerKm(FiberType fiber, double wavelengthNm) {
        List<AttenuationPoint> sheet = fiber.datasheet();
        if (sheet.isEmpty()) {
            throw new IllegalArgumentException("fiber " + fiber.code() + " has no datasheet attenuation points");
        }
        if (wavelengthNm <= sheet.get(0).wavelengthNm()) {
            return sheet.get(0).attenuationDbPerKm();
        }
        for (int i = 1; i < sheet.size(); i++) {
            AttenuationPoint hi = sheet.get(i);
            if (wavelengthNm <= hi.wavelengthNm()) {
                AttenuationPoint lo = sheet.get(i - 1);
                double f = (wavelengthNm - lo.wavelengthNm()) / (hi.wavelengthNm() - lo.wavelengthNm());
                return lo.attenuationDbPerKm() + f * (hi.attenuationDbPerKm() - lo.attenuationDbPerKm());
            }
        }
        return sheet.get(sheet.size() - 1).attenuationDbPerKm();
    }

    /** Loss of one segment at {@code wavelengthNm}, dB (dB/km × km). */
    public double segmentLossDb(CableSegment segment, double wavelengthNm) {
        FiberType fiber = catalog.fiber(segment.fiberTypeCode()).orElseThrow(() -> new IllegalArgumentException(
                "cable " + segment.label() + ": fiber type " + segment.fiberTypeCode() + " is not in the catalog"));
        return attenuationDbPerKm(fiber, wavelengthNm) * segment.lengthM() / 1000.0;
    }

    /** The joint's entered loss, else its connector type's typical loss, dB. */
    public double jointLossDb(Joint joint) {
        if (joint.lossDb().isPresent()) {
            return joint.lossDb().getAsDouble();
        }
        return catalog.connector(joint.connectorTypeA()).orElseThrow(() -> new IllegalArgumentException(
                "joint " + joint.label() + ": connector type " + joint.connectorTypeA() + " is not in the catalog"))
                .typicalLossDb();
    }

    public PointBudget evaluate(MeasurementPoint point, Analyzer analyzer, List<LegSegment> segments, List<LegJoint> joints) {
        double fixedDb = joints.stream().mapToDouble(j -> jointLossDb(j.joint())).sum()
                + catalog.probe(point.probeTypeCode()).map(p -> p.fixedLossDb()).orElse(0.0);
        double centreNm = point.bands().get(0).centreNm();
        double[] wavelengthsNm = new double[PLOT_POINTS];
        double[] lossDb = new double[PLOT_POINTS];
        double step = (analyzer.maxNm() - analyzer.minNm()) / (PLOT_POINTS - 1);
        for (int i = 0; i < PLOT_POINTS; i++) {
            double nm = analyzer.minNm() + i * step;
            wavelengthsNm[i] = nm;
            lossDb[i] = fixedDb + fiberLossDb(segments, nm);
        }
        return new PointBudget(point.tag(), centreNm, fixedDb + fiberLossDb(segments, centreNm),
                analyzer.allowedLossDb(), BASIS, wavelengthsNm, lossDb);
    }

    private double fiberLossDb(List<LegSegment> segments, double nm) {
        double sum = 0;
        for (LegSegment s : segments) {
            sum += segmentLossDb(s.segment(), nm);
        }
        return sum;
    }
}
