package org.strandbook.optics.path;

import java.util.Objects;
import java.util.OptionalDouble;

import org.strandbook.optics.bend.GlogeBend;

/**
 * A length of fiber, optionally routed with bends. Loss = attenuation × length + the Gloge loss of
 * one bend at {@code bendRadiusMm}, charged once however many bends are recorded (see
 * {@code GlogeBend} for why the first bend strips what later ones would).
 *
 * @param label name in the breakdown
 * @param fiber the fiber type
 * @param lengthM length (m), ≥ 0
 * @param bendRadiusMm radius of the tightest routed bends (mm), empty when not known or straight
 * @param bendCount number of bends recorded (the tightest at that radius), ≥ 0; needs a radius when &gt; 0
 */
public record FiberSegment(String label, FiberSpec fiber, double lengthM, OptionalDouble bendRadiusMm, int bendCount)
        implements PathElement {

    public FiberSegment {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(fiber, "fiber");
        Objects.requireNonNull(bendRadiusMm, "bendRadiusMm");
        if (!(lengthM >= 0) || !Double.isFinite(lengthM)) {
            throw new IllegalArgumentException(label + ": fiber length must be a finite number ≥ 0 m, was " + lengthM);
        }
        if (bendCount < 0) {
            throw new IllegalArgumentException(label + ": bend count must not be negative, was " + bendCount);
        }
        if (bendRadiusMm.isPresent() && (!(bendRadiusMm.getAsDouble() > 0) || !Double.isFinite(bendRadiusMm.getAsDouble()))) {
            throw new IllegalArgumentException(label + ": bend radius must be a positive number, was "
                    + bendRadiusMm.getAsDouble() + " mm");
        }
        if (bendCount > 0 && bendRadiusMm.isEmpty()) {
            throw new IllegalArgumentException(label + ": " + bendCount + " bends need a bend radius");
        }
    }

    /** Bends whose loss is charged: {@link GlogeBend#chargedBends(int)} of the recorded count. */
    public int chargedBends() {
        return GlogeBend.chargedBends(bendCount);
    }

    /** A straight (or gently routed) segment: no bend loss. */
    public static FiberSegment straight(String label, FiberSpec fiber, double lengthM) {
        return new FiberSegment(label, fiber, lengthM, OptionalDouble.empty(), 0);
    }

    /** A segment with {@code bendCount} bends of radius {@code bendRadiusMm}. */
    public static FiberSegment bent(String label, FiberSpec fiber, double lengthM, double bendRadiusMm, int bendCount) {
        return new FiberSegment(label, fiber, lengthM, OptionalDouble.of(bendRadiusMm), bendCount);
    }

    @Override
    public ElementKind kind() {
        return ElementKind.FIBER;
    }
}
