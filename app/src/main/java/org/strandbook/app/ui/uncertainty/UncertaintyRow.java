package org.strandbook.app.ui.uncertainty;

import java.util.Locale;

import org.strandbook.uncertainty.BudgetRow;

/**
 * One line of a band's uncertainty budget as the table shows it, with units a technician reads:
 * relative inputs in per cent, sensitivities in dB per unit of the input.
 *
 * @param band the band's name
 * @param atNm where the budget was worked out (the band centre's grid point), nm
 * @param input the input quantity
 * @param basis where its spread comes from, and what kind of basis that is
 * @param distribution the distribution in words
 * @param standardUncertainty u(xᵢ) in {@code unit}
 * @param unit the input's unit as shown ("dB", "m", "%")
 * @param sensitivity cᵢ in dB per {@code unit}
 * @param contributionDb uᵢ(y) = |cᵢ|·u(xᵢ), dB
 * @param share uᵢ(y)²/u_c(y)², 0–1
 */
public record UncertaintyRow(String band, double atNm, String input, String basis, String distribution,
        double standardUncertainty, String unit, double sensitivity, double contributionDb, double share) {

    static UncertaintyRow of(String band, double atNm, BudgetRow r) {
        boolean relative = "relative".equals(r.unit());
        String kind = r.basis().name().toLowerCase(Locale.ROOT).replace('_', ' ');
        return new UncertaintyRow(band, atNm, r.input(), r.basisText() + " (" + kind + ")", r.distribution(),
                relative ? 100 * r.standardUncertainty() : r.standardUncertainty(), relative ? "%" : r.unit(),
                relative ? r.sensitivity() / 100 : r.sensitivity(), r.contribution(), r.share());
    }

    /** The sensitivity's unit: dB per unit of the input. */
    public String sensitivityUnit() {
        return "dB/" + unit;
    }
}
