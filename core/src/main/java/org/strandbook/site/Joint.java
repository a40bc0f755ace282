package org.strandbook.site;

import java.util.OptionalDouble;
import java.util.Set;

/**
 * A mated connection (or splice) between two elements of a leg.
 *
 * @param label          joint label on site, e.g. "J3"
 * @param connectorTypeA catalog code of the connector on the side light comes from
 * @param connectorTypeB catalog code of the connector on the far side
 * @param grade          end-face inspection grade
 * @param lossDb         entered loss, dB; empty means the connector type's typical loss
 * @param lossBasis      whether {@code lossDb} was assumed or measured
 * @param spreads        this joint's own loss spread (a measured joint: the reading's uncertainty), if stated
 */
public record Joint(String label, String connectorTypeA, String connectorTypeB, InspectionGrade grade,
                    OptionalDouble lossDb, LossBasis lossBasis, StatedSpreads spreads)
        implements PathElement {

    public Joint {
        label = Require.text(label, "joint label");
        connectorTypeA = Require.text(connectorTypeA, "joint " + label + ": connector type");
        connectorTypeB = connectorTypeB == null || connectorTypeB.isBlank() ? connectorTypeA : connectorTypeB.strip();
        grade = grade == null ? InspectionGrade.NOT_INSPECTED : grade;
        lossDb = lossDb == null ? OptionalDouble.empty() : lossDb;
        if (lossDb.isPresent()) {
            Require.nonNegative(lossDb.getAsDouble(), "joint " + label + ": loss (dB)");
        }
        lossBasis = lossBasis == null ? LossBasis.ASSUMED : lossBasis;
        spreads = spreads == null ? StatedSpreads.NONE
                : spreads.requireOnly(Set.of(SpreadInput.JOINT_LOSS), "joint " + label);
    }

    /** A joint with no spread of its own: its connector types' or the shipped default applies. */
    public Joint(String label, String connectorTypeA, String connectorTypeB, InspectionGrade grade,
                 OptionalDouble lossDb, LossBasis lossBasis) {
        this(label, connectorTypeA, connectorTypeB, grade, lossDb, lossBasis, StatedSpreads.NONE);
    }

    public Joint withSpreads(StatedSpreads stated) {
        return new Joint(label, connectorTypeA, connectorTypeB, grade, lossDb, lossBasis, stated);
    }
}
