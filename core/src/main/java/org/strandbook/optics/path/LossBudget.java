package org.strandbook.optics.path;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.strandbook.optics.Decibel;
import org.strandbook.optics.WavelengthGrid;

/**
 * The loss budget of a {@link LightPath} on a wavelength grid: the total loss spectrum (dB, one
 * pass along the path) and every element's own contribution, which add up to the total. Notes
 * carry what a technician must see beside the numbers (bend radius below the minimum, Gloge's
 * formula out of range).
 *
 * <p>Compute with {@link #of(LightPath, OpticsCache)} to reuse spectral terms across many paths on
 * the same grid. Immutable; arrays are copied on the way out.
 */
public final class LossBudget {

    private final LightPath path;
    private final WavelengthGrid grid;
    private final double[] totalLossDb;
    private final List<Contribution> contributions;
    private final List<String> notes;

    private LossBudget(LightPath path, WavelengthGrid grid, double[] totalLossDb, List<Contribution> contributions,
            List<String> notes) {
        this.path = path;
        this.grid = grid;
        this.totalLossDb = totalLossDb;
        this.contributions = contributions;
        this.notes = notes;
    }

    /** The budget on {@code grid} with a fresh cache. */
    public static LossBudget of(LightPath path, WavelengthGrid grid) {
        return of(path, new OpticsCache(grid));
    }

    /**
     * The budget on the cache's grid.
     *
     * @throws IllegalArgumentException naming the element when the grid leaves a model's, a
     *         material's or a medium's valid range, or a joint couples no light
     */
    public static LossBudget of(LightPath path, OpticsCache cache) {
        Objects.requireNonNull(path, "path");
        WavelengthGrid grid = cache.grid();
        int n = grid.size();
        double[] total = new double[n];
        List<PathElement> elements = path.elements();
        List<Contribution> parts = new ArrayList<>(elements.size());
        List<String> notes = List.of();
        for (PathElement element : elements) {
            Contribution part;
            if (element instanceof FiberSegment f) {
                double[] att;
                OpticsCache.BendTerms bend;
                try {
                    att = cache.attenuationShared(f.fiber().attenuation());
                    bend = cache.bendTerms(f);
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException("fiber '" + f.label() + "': " + e.getMessage(), e);
                }
                boolean bends = bend != null && f.chargedBends() > 0;
                part = new Contribution(f.label(), ElementKind.FIBER, att, f.lengthM() * 1e-3,
                        bends ? bend.lossDbPerBend() : null, bends ? f.chargedBends() : 0);
                if (bend != null && (bend.clampedPoints() > 0 || !bend.radiusCheck().ok())) {
                    if (notes.isEmpty()) {
                        notes = new ArrayList<>();
                    }
                    addBendNotes(f, bend, notes);
                }
            } else {
                part = new Contribution(element.label(), element.kind(), cache.fixedLossShared(element), 1.0, null, 0);
            }
            part.addTo(total);
            parts.add(part);
        }
        return new LossBudget(path, grid, total, List.copyOf(parts), List.copyOf(notes));
    }

    private static void addBendNotes(FiberSegment f, OpticsCache.BendTerms bend, List<String> notes) {
        if (!bend.radiusCheck().ok()) {
            notes.add("fiber '" + f.label() + "': " + bend.radiusNote());
        }
        if (bend.clampedPoints() > 0 && f.chargedBends() > 0) {
            notes.add("fiber '" + f.label() + "': " + bend.clampNote());
        }
    }

    public LightPath path() {
        return path;
    }

    public WavelengthGrid grid() {
        return grid;
    }

    /** Total one-pass loss (dB) at every grid point, a copy. */
    public double[] totalLossDb() {
        return totalLossDb.clone();
    }

    public double totalLossDbAt(int index) {
        return totalLossDb[index];
    }

    /** Total transmittance (0–1) at every grid point. */
    public double[] totalTransmittance() {
        return Decibel.transmittanceFromLossDb(totalLossDb);
    }

    /** One contribution per path element, in path order. */
    public List<Contribution> contributions() {
        return contributions;
    }

    /** Warnings for the technician; empty when there are none. */
    public List<String> notes() {
        return notes;
    }
}
