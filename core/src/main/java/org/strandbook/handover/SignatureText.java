package org.strandbook.handover;

import java.util.Locale;

import org.strandbook.store.SignatureState;

/** A signature and its standing in one line, the same words in the command line, window and dossier. */
public final class SignatureText {

    private SignatureText() {
    }

    /** "approved (commissioning lead), revision A — SUPERSEDED: point AT-101 changed after it was signed". */
    public static String line(SignatureState s) {
        StringBuilder sb = new StringBuilder(s.signOff().role().name().toLowerCase(Locale.ROOT));
        if (!s.signOff().jobTitle().isEmpty()) {
            sb.append(" (").append(s.signOff().jobTitle()).append(')');
        }
        if (!s.signOff().revision().isEmpty()) {
            sb.append(", revision ").append(s.signOff().revision());
        }
        if (!s.signOff().remark().isEmpty()) {
            sb.append(": ").append(s.signOff().remark());
        }
        if (s.standing() != SignatureState.Standing.CURRENT) {
            sb.append(" \u2014 ").append(s.standing().name().replace('_', ' ')).append(": ").append(s.why());
        }
        return sb.toString();
    }
}
