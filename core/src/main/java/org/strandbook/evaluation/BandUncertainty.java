package org.strandbook.evaluation;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.WavelengthBand;
import org.strandbook.uncertainty.LossUncertainty;
import org.strandbook.uncertainty.PathUncertainty;

/**
 * The uncertainty of a point's predicted loss in one band, worked out at the grid point nearest
 * the band's centre (the inputs' spreads vary slowly across a band; the OH-band slopes are the
 * exception, which is why a band is narrow).
 *
 * @param band the band
 * @param atCentre the budget and interval at its centre
 */
public record BandUncertainty(WavelengthBand band, LossUncertainty atCentre) {

    public BandUncertainty {
        Objects.requireNonNull(band, "band");
        Objects.requireNonNull(atCentre, "atCentre");
    }

    /** Lower end of the coverage interval around a band's predicted loss {@code predictedLossDb}. */
    public double lowDb(double predictedLossDb) {
        return predictedLossDb + atCentre.lowOffsetDb();
    }

    /** Upper end of the coverage interval around a band's predicted loss {@code predictedLossDb}. */
    public double highDb(double predictedLossDb) {
        return predictedLossDb + atCentre.highOffsetDb();
    }

    /** One per band of {@code bands}, from the same budget the prediction used. */
    public static List<BandUncertainty> of(PredictedBudget predicted, List<WavelengthBand> bands,
            PathUncertainty engine) {
        WavelengthGrid grid = predicted.grid();
        List<BandUncertainty> out = new ArrayList<>(bands.size());
        for (WavelengthBand band : bands) {
            out.add(new BandUncertainty(band, engine.at(predicted.budget(), grid.nearestIndex(band.centreNm()),
                    predicted.allowances())));
        }
        return out;
    }
}
