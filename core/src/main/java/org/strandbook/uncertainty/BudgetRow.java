package org.strandbook.uncertainty;

/**
 * One line of an uncertainty budget (JCGM 100:2008, 5.1.3 and the tables of its annex H).
 *
 * @param input name of the input quantity
 * @param unit its unit
 * @param distribution the distribution in words
 * @param basis where the distribution comes from
 * @param basisText the words shown beside it
 * @param standardUncertainty u(xᵢ), in the input's unit
 * @param sensitivity cᵢ, output unit per input unit
 * @param contribution uᵢ(y) = |cᵢ|·u(xᵢ), in the output's unit
 * @param share uᵢ(y)²/u_c(y)², the input's part of the combined variance (0–1)
 */
public record BudgetRow(String input, String unit, String distribution, BasisKind basis, String basisText,
        double standardUncertainty, double sensitivity, double contribution, double share) {
}
