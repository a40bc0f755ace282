package org.strandbook.throughput;

import java.util.Objects;

/**
 * A run of consecutive grid wavelengths masked for the same reason.
 *
 * @param fromNm      first masked grid wavelength, nm
 * @param toNm        last masked grid wavelength, nm
 * @param reason      why
 * @param description the range and reason in words, e.g. "1890–1960 nm: loop signal within 3σ of dark"
 */
public record MaskedRange(double fromNm, double toNm, MaskReason reason, String description) {

    public MaskedRange {
        Objects.requireNonNull(reason, "reason");
        Objects.requireNonNull(description, "description");
        if (!(fromNm <= toNm)) {
            throw new IllegalArgumentException("masked range " + fromNm + "–" + toNm + " nm is reversed");
        }
    }
}
