package org.strandbook.optics.path;

import java.util.Objects;

import org.strandbook.optics.joint.JointMechanics;

/**
 * A connector or splice from one fiber to the next. Loss = core and NA mismatch (from larger to
 * smaller only) + either the computed misalignment and gap Fresnel loss ({@code JointGeometry}) or
 * an entered allowance ({@code ConnectorAllowance}). See {@code JointEfficiency}.
 *
 * @param label name in the breakdown
 * @param from fiber the light comes from
 * @param to fiber the light goes into
 * @param mechanics geometry or allowance
 */
public record JointElement(String label, FiberSpec from, FiberSpec to, JointMechanics mechanics) implements PathElement {

    public JointElement {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        Objects.requireNonNull(mechanics, "mechanics");
    }

    @Override
    public ElementKind kind() {
        return ElementKind.JOINT;
    }
}
