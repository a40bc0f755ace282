package org.strandbook.app.ui.plot;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.strandbook.diagnosis.FittedSignature;
import org.strandbook.diagnosis.Signature;
import org.strandbook.evaluation.PredictedBudget;
import org.strandbook.optics.path.Contribution;
import org.strandbook.optics.path.ElementKind;
import org.strandbook.throughput.ThroughputResult;

/** The curves of a point's two spectral plots, from core's budget and evaluation. */
public final class PointCurves {

    private static final Map<Signature, String> SIGNATURE_WORDS = new EnumMap<>(Map.of(
            Signature.FLAT_EXCESS, "wavelength-flat excess (connector, gap or bend)",
            Signature.OH_BANDS, "OH bands (high-OH fiber)",
            Signature.HYDROGEN, "hydrogen bands",
            Signature.DARKENING, "short-wavelength darkening",
            Signature.REFERENCE_DRIFT, "lamp drift since the reference",
            Signature.FRINGES, "fringes (air gap or crack)"));

    /**
     * Fitted signatures smaller than this everywhere are left off the plot: a tenth of a dB is
     * below what re-mating a connector repeats to (common practice), and the legend stays short.
     */
    static final double SHOWN_SIGNATURE_DB = 0.1;

    private PointCurves() {
    }

    /**
     * The predicted round-trip loss and one curve per element. Elements with the same loss
     * spectrum (the clean joints of one connector type, as a rule) share a curve, labelled with
     * all their names and "each", so the legend stays short without hiding any element.
     */
    public static List<Curve> budget(PredictedBudget budget) {
        double[] nm = budget.grid().wavelengthsNm();
        List<Curve> curves = new ArrayList<>();
        curves.add(new Curve("predicted round trip", "predicted round trip", CurveStyle.line(CurveStyle.BLACK, 2.5),
                nm, budget.totalLossDb()));
        List<double[]> spectra = new ArrayList<>();
        List<List<Contribution>> groups = new ArrayList<>();
        for (Contribution c : budget.contributions()) {
            double[] loss = c.lossDb();
            int same = -1;
            for (int g = 0; g < spectra.size(); g++) {
                if (Arrays.equals(spectra.get(g), loss) && groups.get(g).get(0).kind() == c.kind()) {
                    same = g;
                    break;
                }
            }
            if (same < 0) {
                spectra.add(loss);
                groups.add(new ArrayList<>(List.of(c)));
            } else {
                groups.get(same).add(c);
            }
        }
        int colour = 0;
        for (int g = 0; g < groups.size(); g++) {
            List<Contribution> group = groups.get(g);
            String names = String.join(", ", group.stream().map(Contribution::label).toList());
            String label = ((group.size() > 1 ? names + " (each)" : names) + " " + kindWord(group.get(0).kind())).strip();
            CurveStyle style = group.get(0).kind() == ElementKind.FIBER ? CurveStyle.line(CurveStyle.series(colour++), 1.5)
                    : CurveStyle.dashed(CurveStyle.series(colour++), 1.5);
            curves.add(new Curve(label, style, nm, spectra.get(g)));
        }
        return curves;
    }

    /**
     * The latest measured loss against the prediction, their difference, and each fitted
     * signature: what the diagnosis says the difference is made of.
     */
    public static List<Curve> deviation(PredictedBudget predicted, ThroughputResult measured, List<FittedSignature> fitted) {
        double[] nm = predicted.grid().wavelengthsNm();
        double[] p = predicted.totalLossDb();
        double[] m = predicted.grid().equals(measured.grid()) ? measured.lossDb()
                : measured.grid().resample(measured.lossDb(), predicted.grid());
        double[] dev = new double[p.length];
        for (int i = 0; i < dev.length; i++) {
            dev[i] = m[i] - p[i];
        }
        List<Curve> curves = new ArrayList<>();
        curves.add(new Curve("predicted", CurveStyle.line(CurveStyle.BLACK, 2), nm, p));
        curves.add(new Curve("measured (latest loop scan)", CurveStyle.line(CurveStyle.BLUE, 2), nm, m));
        curves.add(new Curve("measured \u2212 predicted", "measured \u00F7 predicted", CurveStyle.line(CurveStyle.GREY, 2),
                nm, dev));
        int colour = 1;
        for (FittedSignature f : fitted) {
            double[] loss = f.lossDb();
            // a fringe ripple is drawn whatever its size: 0.1 dB peak to peak already upsets a chemometric model
            boolean ripple = f.signature() == Signature.FRINGES;
            if (loss.length != nm.length || (!ripple && largest(loss) < SHOWN_SIGNATURE_DB)) {
                continue;
            }
            String words = SIGNATURE_WORDS.getOrDefault(f.signature(), f.signature().name().toLowerCase(Locale.ROOT));
            if (ripple) {
                words += String.format(Locale.ROOT, ", %.2f dB peak to peak", 2 * largest(loss));
            }
            curves.add(new Curve("fitted: " + words, CurveStyle.dashed(CurveStyle.series(colour++), 1.5), nm, loss));
        }
        return curves;
    }

    private static double largest(double[] lossDb) {
        double m = 0;
        for (double v : lossDb) {
            if (Double.isFinite(v)) {
                m = Math.max(m, Math.abs(v));
            }
        }
        return m;
    }

    private static String kindWord(ElementKind kind) {
        return switch (kind) {
            case FIBER -> "(fiber)";
            case JOINT -> "(joint)";
            case FACE -> "(face)";
            case PROBE -> "";
        };
    }
}
