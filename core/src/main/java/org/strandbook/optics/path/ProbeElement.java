package org.strandbook.optics.path;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The probe in the process line: its windows, a fixed entered loss (mirror, lens coupling, what
 * the vendor states) and optionally the optical path through a reference medium.
 *
 * @param label name in the breakdown
 * @param windows windows crossed by the light
 * @param fixedLossDb entered wavelength-independent loss (dB), ≥ 0
 * @param medium optical path through a medium, if any
 */
public record ProbeElement(String label, List<ProbeWindow> windows, double fixedLossDb, Optional<MediumPath> medium)
        implements PathElement {

    public ProbeElement {
        Objects.requireNonNull(label, "label");
        windows = List.copyOf(windows);
        Objects.requireNonNull(medium, "medium");
        if (!(fixedLossDb >= 0) || !Double.isFinite(fixedLossDb)) {
            throw new IllegalArgumentException(label + ": fixed probe loss must be a finite number ≥ 0 dB, was " + fixedLossDb);
        }
    }

    @Override
    public ElementKind kind() {
        return ElementKind.PROBE;
    }
}
