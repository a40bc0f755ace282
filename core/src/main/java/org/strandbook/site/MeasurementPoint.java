package org.strandbook.site;

import java.util.List;
import java.util.OptionalDouble;

/**
 * A measurement point: one probe on the process, reached from an analyzer channel by a send leg
 * and a return leg of fiber.
 *
 * @param tag                  point tag, unique within the site
 * @param service              process service description
 * @param location             where the probe sits (unit, line, elevation)
 * @param analyzerTag          the analyzer serving it
 * @param channel              the analyzer channel, 1-based
 * @param probeTypeCode        catalog code of the probe type
 * @param bands                bands of interest, at least one
 * @param toleranceDb          acceptance tolerance, dB; empty means the site default
 * @param hazardousArea        the probe or any junction box sits in a classified hazardous area
 * @param hydrogenService      the fiber runs near hydrogen-bearing process (darkening risk)
 * @param processTemperatureC  process temperature at the probe, °C, if known
 */
public record MeasurementPoint(String tag, String service, String location, String analyzerTag, int channel,
                               String probeTypeCode, List<WavelengthBand> bands, OptionalDouble toleranceDb,
                               boolean hazardousArea, boolean hydrogenService,
                               OptionalDouble processTemperatureC) {

    public MeasurementPoint {
        tag = Require.text(tag, "point tag");
        service = service == null ? "" : service.strip();
        location = location == null ? "" : location.strip();
        analyzerTag = Require.text(analyzerTag, "point " + tag + ": analyzer tag");
        if (channel < 1) {
            throw new IllegalArgumentException("point " + tag + ": channel must be 1 or more, was " + channel);
        }
        probeTypeCode = Require.text(probeTypeCode, "point " + tag + ": probe type");
        bands = List.copyOf(bands);
        if (bands.isEmpty()) {
            throw new IllegalArgumentException("point " + tag + ": needs at least one band of interest");
        }
        toleranceDb = toleranceDb == null ? OptionalDouble.empty() : toleranceDb;
        if (toleranceDb.isPresent()) {
            Require.positive(toleranceDb.getAsDouble(), "point " + tag + ": tolerance (dB)");
        }
        processTemperatureC = processTemperatureC == null ? OptionalDouble.empty() : processTemperatureC;
    }

    /** The same point with another probe type, as it was before (or after) a probe replacement. */
    public MeasurementPoint withProbeTypeCode(String code) {
        return code.equals(probeTypeCode) ? this : new MeasurementPoint(tag, service, location, analyzerTag, channel,
                code, bands, toleranceDb, hazardousArea, hydrogenService, processTemperatureC);
    }

    /** The tolerance that applies: the point's own, else the site default. */
    public double effectiveToleranceDb(Site site) {
        return toleranceDb.orElse(site.defaultToleranceDb());
    }
}
