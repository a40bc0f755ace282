package org.strandbook.optics.joint;

/**
 * How the extrinsic loss of a joint is known: computed from its geometry ({@link JointGeometry}) or
 * entered as an allowance ({@link ConnectorAllowance}). The intrinsic loss of a core or NA
 * mismatch is computed in both cases.
 */
public sealed interface JointMechanics permits JointGeometry, ConnectorAllowance {
}
