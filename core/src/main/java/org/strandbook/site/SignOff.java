package org.strandbook.site;

import java.time.Instant;

/** A signature on the site record, or on one point when {@code pointTag} is not empty. */
public record SignOff(SignOffRole role, String name, Instant signedAt, String pointTag, String remark) {

    public SignOff {
        if (role == null) {
            throw new IllegalArgumentException("sign-off role missing");
        }
        name = Require.text(name, "sign-off name");
        pointTag = pointTag == null ? "" : pointTag.strip();
        remark = remark == null ? "" : remark;
    }
}
