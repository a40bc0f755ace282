package org.strandbook.server;

import java.time.Instant;
import java.time.LocalDate;

/**
 * A point's verdict as a laptop evaluated it and reported it to the plant server.
 *
 * @param status     PASS, REVIEW, FAIL or NOT_EVALUATED (no scan pair to judge yet)
 * @param worstBand  the band that decides the status; null when not evaluated
 * @param marginDb   that band's margin, dB; null when not evaluated or no light returned
 * @param runOutDate the earliest forecast date at which a band runs out of margin; null when none
 */
public record PointStanding(String site, String tag, String status, String worstBand, Double marginDb,
                            LocalDate runOutDate, Instant evaluatedAt) {
}
