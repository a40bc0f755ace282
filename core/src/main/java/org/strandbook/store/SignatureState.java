package org.strandbook.store;

import org.strandbook.site.SignOff;

/**
 * A signature and whether what it signed is still what the workbook holds.
 *
 * @param id       the sign-off's row key
 * @param signOff  the signature
 * @param standing current, superseded, tampered, signed before signatures kept a digest, or signed in
 *                 another copy of the site
 * @param why      in words, for a standing other than current
 */
public record SignatureState(long id, SignOff signOff, Standing standing, String why) {

    public enum Standing {
        /** What was signed is unchanged. */
        CURRENT,
        /** What was signed has changed since, through Strandbook: the signature no longer covers it. */
        SUPERSEDED,
        /** The signature's own record no longer agrees with the audit trail it names. */
        TAMPERED,
        /** Signed before signatures recorded what they signed (schema 1 and 2). */
        NO_DIGEST,
        /**
         * A site signature given in another copy of the site and brought here by the plant server:
         * the audit trail it names is that copy's, so this copy can only say nothing changed since it came.
         */
        SIGNED_ELSEWHERE
    }

    /** "APPROVED by R. Inglenook (commissioning lead) on 2026-05-04, point AT-101, revision A". */
    public String describe() {
        SignOff s = signOff;
        return s.role().name() + " by " + s.name() + (s.jobTitle().isEmpty() ? "" : " (" + s.jobTitle() + ")")
                + " on " + s.signedAt().toString().substring(0, 10)
                + (s.onSite() ? ", site record" : ", point " + s.pointTag())
                + (s.revision().isEmpty() ? "" : ", revision " + s.revision());
    }
}
