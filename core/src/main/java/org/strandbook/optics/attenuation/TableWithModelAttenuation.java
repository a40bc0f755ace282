package org.strandbook.optics.attenuation;

import java.util.Objects;

import org.strandbook.optics.WavelengthRange;

/**
 * Datasheet points inside their range, a model outside it, joined continuously: below the table the
 * model is scaled by table(first)/model(first), above it by table(last)/model(last), so the curve
 * meets the table's end points and keeps the model's spectral shape beyond them.
 *
 * <p>The model must be valid at both table end points; the combination is valid over the model's
 * range.
 *
 * @param table datasheet points
 * @param model shape used outside the table
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
            return model.attenuationDbPerKm(wavelengthNm) * lowScale();
        }
        if (wavelengthNm > table.lastNm()) {
            return model.attenuationDbPerKm(wavelengthNm) * highScale();
        }
        return table.attenuationDbPerKm(wavelengthNm);
    }

    /** Factor applied to the model below the table. */
    public double lowScale() {
        return table.attenuationDbPerKm(table.firstNm()) / model.attenuationDbPerKm(table.firstNm());
    }

    /** Factor applied to the model above the table. */
    public double highScale() {
        return table.attenuationDbPerKm(table.lastNm()) / model.attenuationDbPerKm(table.lastNm());
    }

    @Override
    public String describe() {
        return table.describe() + " extended by " + model.describe();
    }
}
