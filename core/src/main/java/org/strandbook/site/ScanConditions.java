package org.strandbook.site;

import java.util.OptionalDouble;

/**
 * How a scan was taken.
 *
 * @param operator            who took it
 * @param integrationMs       detector integration time, ms (0 when unknown)
 * @param coAdded             number of co-added scans (1 when unknown)
 * @param ambientTemperatureC ambient temperature at the analyzer, °C, if recorded
 * @param processTemperatureC process temperature at the probe, °C, if recorded
 */
public record ScanConditions(String operator, double integrationMs, int coAdded,
                             OptionalDouble ambientTemperatureC, OptionalDouble processTemperatureC) {

    public ScanConditions {
        operator = operator == null ? "" : operator.strip();
        Require.nonNegative(integrationMs, "integration time (ms)");
        if (coAdded < 1) {
            throw new IllegalArgumentException("co-added scans must be 1 or more, was " + coAdded);
        }
        ambientTemperatureC = ambientTemperatureC == null ? OptionalDouble.empty() : ambientTemperatureC;
        processTemperatureC = processTemperatureC == null ? OptionalDouble.empty() : processTemperatureC;
    }

    public static ScanConditions unknown(String operator) {
        return new ScanConditions(operator, 0, 1, OptionalDouble.empty(), OptionalDouble.empty());
    }
}
