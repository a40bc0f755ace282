package org.strandbook.site;

import java.time.Instant;

/**
 * A signature on the site record (the dossier revision), or on one point when {@code pointTag} is
 * not empty.
 *
 * @param role          prepared, checked or approved
 * @param name          who signed
 * @param signedAt      when
 * @param pointTag      the point signed, empty for the site record
 * @param remark        an optional comment
 * @param jobTitle      the signer's job title, e.g. "commissioning lead"; may be empty
 * @param revision      the dossier revision letter signed; may be empty on older signatures
 * @param contentSha256 SHA-256 of what was signed (a point's evaluation inputs, or the audit
 *                      trail's head hash for the site record); empty on older signatures
 */
public record SignOff(SignOffRole role, String name, Instant signedAt, String pointTag, String remark,
                      String jobTitle, String revision, String contentSha256) {

    public SignOff {
        if (role == null) {
            throw new IllegalArgumentException("sign-off role missing");
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a sign-off needs the signer's name");
        }
        name = name.strip();
        pointTag = pointTag == null ? "" : pointTag.strip();
        remark = remark == null ? "" : remark;
        jobTitle = jobTitle == null ? "" : jobTitle.strip();
        revision = revision == null ? "" : revision.strip();
        contentSha256 = contentSha256 == null ? "" : contentSha256;
    }

    /** A signature without title, revision or content digest (as schema 1 and 2 kept them). */
    public SignOff(SignOffRole role, String name, Instant signedAt, String pointTag, String remark) {
        this(role, name, signedAt, pointTag, remark, "", "", "");
    }

    /** True for a signature on the site record rather than a point. */
    public boolean onSite() {
        return pointTag.isEmpty();
    }
}
