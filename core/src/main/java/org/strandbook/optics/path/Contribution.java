package org.strandbook.optics.path;

import java.util.Objects;

/**
 * One element's own share of a {@link LossBudget}: its label, kind and loss spectrum (dB).
 *
 * <p>Held as a linear combination of at most two cached spectra of the {@link OpticsCache}
 * (a fiber: attenuation × length + bend loss × charged bends; anything else: its cached loss × 1), so a
 * budget of many elements allocates nothing per element; {@link #lossDb()} materialises the
 * spectrum on request with the same arithmetic the total used.
 */
public final class Contribution {

    private final String label;
    private final ElementKind kind;
    private final double[] base;
    private final double baseScale;
    private final double[] extra;
    private final double extraScale;

    Contribution(String label, ElementKind kind, double[] base, double baseScale, double[] extra, double extraScale) {
        this.label = Objects.requireNonNull(label, "label");
        this.kind = Objects.requireNonNull(kind, "kind");
        this.base = base;
        this.baseScale = baseScale;
        this.extra = extra;
        this.extraScale = extraScale;
    }

    public String label() {
        return label;
    }

    public ElementKind kind() {
        return kind;
    }

    /** Loss (dB) at every grid point, a fresh array. */
    public double[] lossDb() {
        double[] out = new double[base.length];
        if (extra == null) {
            for (int i = 0; i < out.length; i++) {
                out[i] = base[i] * baseScale;
            }
        } else {
            for (int i = 0; i < out.length; i++) {
                out[i] = base[i] * baseScale + extra[i] * extraScale;
            }
        }
        return out;
    }

    /** Loss (dB) at one grid index. */
    public double lossDbAt(int index) {
        return extra == null ? base[index] * baseScale : base[index] * baseScale + extra[index] * extraScale;
    }

    /** Adds this contribution into {@code total} (same arithmetic as {@link #lossDbAt}). */
    void addTo(double[] total) {
        int n = total.length;
        if (extra == null) {
            if (baseScale == 1.0) {
                for (int i = 0; i < n; i++) {
                    total[i] += base[i];
                }
            } else {
                for (int i = 0; i < n; i++) {
                    total[i] += base[i] * baseScale;
                }
            }
        } else {
            for (int i = 0; i < n; i++) {
                total[i] += base[i] * baseScale + extra[i] * extraScale;
            }
        }
    }

    @Override
    public String toString() {
        return kind + " " + label;
    }
}
