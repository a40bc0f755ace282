package org.strandbook.site;

import java.util.Set;

/**
 * A catalog connector type.
 *
 * @param code          catalog code, unique within the workbook
 * @param description   free text
 * @param family        mating family, e.g. "SMA 905"; only connectors of one family mate directly
 * @param typicalLossDb loss of a clean mated pair assumed when a joint has no entered loss, dB
 * @param airGap        true when the mated faces meet across an air gap (adds two Fresnel faces)
 * @param spreads       the mated pair's loss spread, if the site states one
 */
public record ConnectorType(String code, String description, String family, double typicalLossDb, boolean airGap,
                            StatedSpreads spreads) {

    public ConnectorType {
        code = Require.text(code, "connector type code");
        description = description == null ? "" : description.strip();
        family = Require.text(family, "connector " + code + ": family");
        Require.nonNegative(typicalLossDb, "connector " + code + ": typical loss (dB)");
        spreads = spreads == null ? StatedSpreads.NONE
                : spreads.requireOnly(Set.of(SpreadInput.CONNECTOR_LOSS), "connector type " + code);
    }

    /** A connector type with no stated spread: its loss takes the shipped default. */
    public ConnectorType(String code, String description, String family, double typicalLossDb, boolean airGap) {
        this(code, description, family, typicalLossDb, airGap, StatedSpreads.NONE);
    }

    public ConnectorType withSpreads(StatedSpreads stated) {
        return new ConnectorType(code, description, family, typicalLossDb, airGap, stated);
    }

    /** Two connectors mate directly only within one family. */
    public boolean matesWith(ConnectorType other) {
        return family.equalsIgnoreCase(other.family);
    }
}
