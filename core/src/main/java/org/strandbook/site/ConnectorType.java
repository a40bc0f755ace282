package org.strandbook.site;

/**
 * A catalog connector type.
 *
 * @param code          catalog code, unique within the workbook
 * @param description   free text
 * @param family        mating family, e.g. "SMA 905"; only connectors of one family mate directly
 * @param typicalLossDb loss of a clean mated pair assumed when a joint has no entered loss, dB
 * @param airGap        true when the mated faces meet across an air gap (adds two Fresnel faces)
 */
public record ConnectorType(String code, String description, String family, double typicalLossDb, boolean airGap) {

    public ConnectorType {
        code = Require.text(code, "connector type code");
        description = description == null ? "" : description.strip();
        family = Require.text(family, "connector " + code + ": family");
        Require.nonNegative(typicalLossDb, "connector " + code + ": typical loss (dB)");
    }

    /** Two connectors mate directly only within one family. */
    public boolean matesWith(ConnectorType other) {
        return family.equalsIgnoreCase(other.family);
    }
}
