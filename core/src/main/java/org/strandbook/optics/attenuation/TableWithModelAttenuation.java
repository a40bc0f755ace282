package org.strandbook.optics.attenuation;

import java.util.Objects;

import org.strandbook.optics.WavelengthRange;

/**
 * Datasheet points inside their range, the physical model outside it, joined additively: beyond an
 * end of the table the curve is the model plus the constant excess E = table − model found at that
 * end, so it meets the table there and keeps the model's own spectral shape and size beyond it.
 *
 * <p>Why additive: what a datasheet holds above our model is mostly loss the model does not know
 * and that hardly depends on wavelength (waveguide imperfections, the constant term of published
 * attenuation fits α = A/λ⁴ + B + α_IR; from memory: Ohashi et al., J. Lightwave Technol. 10, 539
 * (1992)). Scaling the model by table/model instead would multiply the steep infrared edge and the
 * OH bands by that ratio, which a few dB/km of imperfection loss cannot do. A constant excess fades
 * by itself where the physics dominates: at 2350 nm the edge is near 10³ dB/km, against an excess
 * of a few dB/km.
 *
 * <p>When the table lies below the model at its end (E &lt; 0) a constant would drive the curve
 * toward zero or below where the model dips (between OH bands); there the excess is limited so the
 * curve never falls below the model scaled by table/model at that end, which it meets at the join
 * and which stays positive.
 *
 * <p>The model must be valid at both table end points; the combination is valid over the model's
 * range.
 *
 * @param table datasheet points
 * @param model physics used outside the table
 */
public record TableWithModelAttenuation(TabulatedAttenuation table, AttenuationModel model) implements AttenuationModel {

    public TableWithModelAttenuation {
        Objects.requireNonNull(table, "table");
        Objects.requireNonNull(model, "model");
        if (!model.validRange().contains(table.firstNm()) || !model.validRange().contains(table.lastNm())) {
            throw new IllegalArgumentException("the model " + model.describe() + " (" + model.validRange()
                    + ") must cover the table's range " + table.validRange());
        }
    }

    @Override
    public WavelengthRange validRange() {
        return model.validRange();
    }

    @Override
    public double attenuationDbPerKm(double wavelengthNm) {
        model.validRange().require(wavelengthNm, describe());
        if (wavelengthNm < table.firstNm()) {
            return beyondTable(wavelengthNm, table.firstNm());
        }
        if (wavelengthNm > table.lastNm()) {
            return beyondTable(wavelengthNm, table.lastNm());
        }
        return table.attenuationDbPerKm(wavelengthNm);
    }

    /** Excess (dB/km) of the table over the model at its first point, added below the table. */
    public double lowExcessDbPerKm() {
        return excessAt(table.firstNm());
    }

    /** Excess (dB/km) of the table over the model at its last point, added above the table. */
    public double highExcessDbPerKm() {
        return excessAt(table.lastNm());
    }

    private double excessAt(double joinNm) {
        return table.attenuationDbPerKm(joinNm) - model.attenuationDbPerKm(joinNm);
    }

    private double beyondTable(double wavelengthNm, double joinNm) {
        double modelDbPerKm = model.attenuationDbPerKm(wavelengthNm);
        double tableAtJoin = table.attenuationDbPerKm(joinNm);
        double modelAtJoin = model.attenuationDbPerKm(joinNm);
        double excess = tableAtJoin - modelAtJoin;
        double additive = modelDbPerKm + excess;
        if (excess >= 0) {
            return additive;
        }
        return Math.max(additive, modelDbPerKm * (tableAtJoin / modelAtJoin));
    }

    @Override
    public String describe() {
        return table.describe() + " extended by " + model.describe();
    }
}
