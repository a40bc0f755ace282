package org.strandbook.diagnosis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

import org.strandbook.fit.ColumnPair;
import org.strandbook.fit.CollinearityReport;
import org.strandbook.fit.LeastSquaresProblem;
import org.strandbook.fit.NonNegativeLeastSquares;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.AttenuationShapes;
import org.strandbook.optics.attenuation.OhBand;
import org.strandbook.optics.attenuation.SilicaFiberGrade;
import org.strandbook.throughput.ThroughputResult;

/**
 * Explains a deviation spectrum (measured − predicted loss, dB) as a non-negative combination of
 * fault signatures ({@link Signature}) plus a signed lamp-drift term, fitted by Lawson–Hanson
 * NNLS (Lawson &amp; Hanson, "Solving Least Squares Problems", 1974, ch. 23) over the measured
 * wavelengths, each weighted by 1/σ. The σ of a point is its detector-noise σ combined with a model
 * floor ({@link #MODEL_FLOOR_DB}), so that a very quiet detector does not let one region dominate.
 *
 * <p>The flat term is fitted signed: connectors are budgeted at a conservative allowance, so a
 * healthy path often loses a few tenths of a dB less than predicted, and a non-negative flat term
 * would push that shortfall into the other shapes. A positive flat excess is reported as a fault; a
 * negative one of at least 1 dB as a problem of the reference or the records.
 *
 * <p>Each band amount is stated where it was measured ({@link StatedAmount}): an OH excess at its
 * strongest measured band, and "at least" when a stronger band of the same shape was dark or masked.
 * Where the measured range holds none of the bands that tell OH from molecular hydrogen, one finding
 * says so ({@link OhOrHydrogen}).
 *
 * <p>The lamp-drift term is the change of a thermal lamp's spectrum when its colour temperature
 * changes between reference and loop scan, from Planck's law ({@link
 * AttenuationShapes#planckBrighteningDbPerK}): close to linear in 1/λ over the NIR (Wien), not in λ.
 * Its overall brightness change is carried by the flat term.
 *
 * <p>A wavelength-flat excess cannot say whether a connector or a bend is to blame (for large
 * cores Gloge's bend loss is nearly flat too); the workbook's records rank the candidates. Fringes
 * left in the residual are searched for separately over fringe periods.
 */
public final class DeviationDiagnoser {

    /** dB: modelling scatter added in quadrature to detector noise (a design choice). */
    public static final double MODEL_FLOOR_DB = 0.02;
    /** Shape parameter of the hydrogen signature: the 2420 nm band relative to 1240 nm (not a claim). */
    public static final double HYDROGEN_2420_RELATIVE = 5.0;
    /** |cos| above which two signatures are reported as indistinguishable over the measured range. */
    public static final double COLLINEAR_COSINE = 0.95;
    /**
     * Variance inflation above which a finding is said to rest on a term largely in the span of the
     * others: 10, the usual cut (Kutner, Nachtsheim, Neter and Li, "Applied Linear Statistical
     * Models", 5th ed. 2005, §10.5); the choice of that cut is ours (design choice).
     */
    public static final double INFLATION_LIMIT = 10;
    /**
     * K: colour temperature the lamp-drift shape is worked out at, a halogen filament's usual
     * 2800–3200 K (common practice); the shape barely changes over that range.
     */
    public static final double LAMP_COLOUR_TEMPERATURE_K = 3000;
    /**
     * Design choice: no shape is fitted when the usable wavelengths span less than this share of
     * the scans' common range in photon energy. Over a short span the smooth shapes (flat, lamp
     * drift, darkening edge, bend) differ by less than the noise and trade off against each other:
     * a fit there names large opposite amounts that cancel, e.g. what is left beside a clipped
     * reference.
     */
    public static final double MIN_USABLE_ENERGY_SHARE = 1.0 / 3;
    /**
     * K: the largest change of a halogen lamp's colour temperature between reference and loop scan
     * the drift term may stand for (design choice). 600 K is a fifth of a 3000 K filament's
     * temperature: a lamp that far off is failing, not drifting. A fitted tilt beyond it is no lamp.
     */
    public static final double MAX_LAMP_DRIFT_K = 600;

    private final double minReportDb;

    private DeviationDiagnoser(double minReportDb) {
        this.minReportDb = minReportDb;
    }

    /**
     * Reports a cause when its largest effect over the measured range reaches 0.3 dB (common
     * practice: re-mating an SMA pair scatters by a few tenths of a dB).
     */
    public static DeviationDiagnoser withDefaults() {
        return new DeviationDiagnoser(0.3);
    }

    public DeviationDiagnoser withMinReportDb(double db) {
        return new DeviationDiagnoser(db);
    }

    public Diagnosis diagnose(ThroughputResult measured, double[] predictedLossDb, PathEvidence evidence) {
        WavelengthGrid grid = measured.grid();
        grid.requireSameLength(predictedLossDb);
        if (measured.noLightReturned()) {
            return broken(evidence);
        }
        boolean[] usable = measured.usable();
        double[] loss = measured.lossDb();
        double[] sigma = measured.sigmaDb();
        int[] rows = usableRows(usable);
        if (rows.length < 8) {
            return new Diagnosis(List.of(), Double.NaN, List.of(), Optional.empty(), List.of(),
                    "too few measured wavelengths (" + rows.length + ") to diagnose");
        }
        MeasuredRange range = MeasuredRange.of(measured);
        double usableShare = range.usableEnergyShare();
        if (usableShare < MIN_USABLE_ENERGY_SHARE) {
            return new Diagnosis(List.of(), Double.NaN, List.of(), Optional.empty(), List.of(),
                    tooShortSpan(range, usableShare, measured.saturationReasons()));
        }
        double[] b = new double[rows.length];
        double[] s = new double[rows.length];
        for (int r = 0; r < rows.length; r++) {
            int i = rows[r];
            b[r] = loss[i] - predictedLossDb[i];
            double noise = Double.isFinite(sigma[i]) ? sigma[i] : 0;
            s[r] = Math.sqrt(noise * noise + MODEL_FLOOR_DB * MODEL_FLOOR_DB);
        }
        List<Column> columns = columns(grid, rows);
        double[][] a;
        LeastSquaresProblem problem;
        double[] x;
        while (true) {
            a = new double[columns.size()][];
            List<Integer> signed = new ArrayList<>();
            for (int j = 0; j < a.length; j++) {
                a[j] = columns.get(j).values;
                Signature sig = columns.get(j).signature;
                if (sig == Signature.REFERENCE_DRIFT || sig == Signature.FLAT_EXCESS) {
                    signed.add(j);
                }
            }
            problem = LeastSquaresProblem.ofColumns(a, b).withRowSigmas(s)
                    .withSignedColumns(signed.stream().mapToInt(Integer::intValue).toArray());
            x = NonNegativeLeastSquares.withDefaults().solve(problem).coefficients();
            int drift = indexOf(columns, Signature.REFERENCE_DRIFT);
            if (drift < 0 || Math.abs(x[drift] / lampDriftDbPerK(grid.firstNm(), grid.lastNm())) <= MAX_LAMP_DRIFT_K) {
                break;
            }
            // a tilt no lamp makes: the signed drift term was pairing with a flat term of the other sign
            // to draw a curve neither shape has (a shortfall that follows the fiber's own attenuation
            // read as a flat excess); fitted again without it, that curve is left to the flat term
            // and the residual, where it shows
            columns = new ArrayList<>(columns);
            columns.remove(drift);
        }
        double[] residual = problem.residual(x);
        columns = creditLampLevel(columns, x, grid, rows, minReportDb);

        double[] effect = new double[columns.size()];
        double totalEffect = 0;
        for (int j = 0; j < columns.size(); j++) {
            for (double v : columns.get(j).ranked) {
                effect[j] += Math.abs(x[j] * v);
            }
            totalEffect += effect[j];
        }
        List<Finding> findings = new ArrayList<>();
        Map<Finding, Double> peaks = new java.util.IdentityHashMap<>();
        for (int j = 0; j < columns.size(); j++) {
            Column c = columns.get(j);
            double peak = 0;
            for (double v : c.ranked) {
                peak = Math.max(peak, Math.abs(x[j] * v));
            }
            // reported by its whole effect (a credited lamp drift with its level), ranked by its own shape
            double whole = 0;
            for (double v : c.values) {
                whole = Math.max(whole, Math.abs(x[j] * v));
            }
            double share = totalEffect > 0 ? 100 * effect[j] / totalEffect : 0;
            if (c.signature == Signature.FLAT_EXCESS && x[j] < 0) {
                FlatExcessRanking.betterThanPredicted(x[j], c.atNm, share, minReportDb,
                        !measured.negativeLossRanges().isEmpty(), shortfall(grid, rows, b, predictedLossDb))
                        .ifPresent(f -> {
                            findings.add(f);
                            peaks.put(f, -f.amountDb());
                        });
                continue;
            }
            if (whole < minReportDb) {
                continue;
            }
            Finding f = finding(c, x[j], share, evidence, range, grid);
            findings.add(f);
            peaks.put(f, peak);
        }
        int oh = indexOf(columns, Signature.OH_BANDS);
        int h2 = indexOf(columns, Signature.HYDROGEN);
        if (oh >= 0 && h2 >= 0) {
            double share = totalEffect > 0 ? 100 * (effect[oh] + effect[h2]) / totalEffect : 0;
            OhOrHydrogen.whereUndecided(scaled(columns.get(oh).onGrid, x[oh]), scaled(columns.get(h2).onGrid, x[h2]),
                    share, range, evidence, minReportDb).ifPresent(undecided -> {
                    findings.removeIf(f -> f.signature() == Signature.OH_BANDS
                            || f.signature() == Signature.HYDROGEN);
                    findings.add(undecided.finding());
                    peaks.put(undecided.finding(), undecided.peakDb());
                });
        }
        // the largest effect at any measured wavelength first: what a technician would see first
        findings.sort(Comparator.comparingDouble((Finding f) -> peaks.get(f)).reversed());

        double rms = rms(residual);
        // searched whatever the fit's χ²: a 0.1 dB ripple hardly raises it
        double[] unexplained = new double[residual.length];
        for (int r = 0; r < residual.length; r++) {
            unexplained[r] = -residual[r];
        }
        Optional<FringeReport> fringes = FringeSearch.search(grid, rows, unexplained, s);
        fringes.ifPresent(f -> findings.add(fringeFinding(f, evidence)));
        List<FittedSignature> fitted = new ArrayList<>();
        for (int j = 0; j < columns.size(); j++) {
            if (x[j] != 0) {
                double[] curve = columns.get(j).onGrid.clone();
                for (int i = 0; i < curve.length; i++) {
                    curve[i] *= x[j];
                }
                fitted.add(new FittedSignature(columns.get(j).signature, curve));
            }
        }
        fringes.ifPresent(f -> {
            double[] ripple = new double[grid.size()];
            for (int i = 0; i < ripple.length; i++) {
                ripple[i] = f.rippleDb(grid.wavelengthNm(i));
            }
            fitted.add(new FittedSignature(Signature.FRINGES, ripple));
        });
        List<String> collinear = collinearNotes(problem, columns, findings, a, b, s, x);
        String summary = findings.isEmpty()
                ? String.format(Locale.ROOT, "no fault signature reaches %.1f dB: the path behaves as predicted"
                        + " (residual %.2f dB RMS)", minReportDb, rms)
                : findings.get(0).text();
        return new Diagnosis(findings, rms, collinear, fringes, fitted, summary);
    }

    private static String tooShortSpan(MeasuredRange range, double share, List<String> saturationReasons) {
        double[] span = range.usableSpanNm();
        String why = saturationReasons.isEmpty() ? ""
                : " The rest is masked: " + String.join("; ", saturationReasons) + ".";
        return String.format(Locale.ROOT, "not diagnosed: the loss was measured only over %.0f–%.0f nm, %.0f %% of the"
                + " range in photon energy, too short a span to tell the fault shapes apart.%s", span[0], span[1],
                100 * share, why);
    }

    private static Diagnosis broken(PathEvidence evidence) {
        String joints = evidence.joints().stream().map(PathEvidence.JointEvidence::label)
                .collect(Collectors.joining(", "));
        String text = "no light returned in any band: a broken fiber or an open connector. Check that every joint"
                + " is mated (" + joints + "), then test the send and return legs separately. Switch the lamp off"
                + " before opening a connector and never look into a fiber end.";
        Finding f = new Finding(Signature.FLAT_EXCESS, List.of(Cause.BROKEN_FIBER), Double.POSITIVE_INFINITY,
                Double.NaN, 100, evidence.joints().isEmpty() ? "" : evidence.joints().get(0).label(), text);
        return new Diagnosis(List.of(f), Double.NaN, List.of(), Optional.empty(), List.of(), text);
    }

    /**
     * A signature's shape over the measured rows ({@code values}) and over the whole grid, and the
     * shape its effect is ranked by ({@code ranked}: for the lamp, its tilt without the level).
     */
    private record Column(Signature signature, double[] values, double[] onGrid, double atNm, double[] ranked) {

        Column(Signature signature, double[] values, double[] onGrid, double atNm) {
            this(signature, values, onGrid, atNm, values);
        }
    }

    /** Signature columns, each 1 dB at its reference wavelength. */
    private static List<Column> columns(WavelengthGrid grid, int[] rows) {
        double first = grid.firstNm();
        double last = grid.lastNm();
        double mid = 0.5 * (first + last);
        int n = grid.size();
        double ohRef = ohReferenceNm(grid);
        double ohScale = 1.0 / AttenuationShapes.ohAbsorptionDbPerKmPerPpm(ohRef);
        double h2Scale = 1.0 / AttenuationShapes.hydrogenBandShape(AttenuationShapes.HYDROGEN_BAND_1240_NM,
                HYDROGEN_2420_RELATIVE);
        double darkScale = 1.0 / AttenuationShapes.radiationDarkeningShape(first);
        double[] flat = fill(n, 1.0);
        double[] oh = new double[n];
        double[] h2 = new double[n];
        double[] dark = new double[n];
        double[] drift = new double[n];
        double brightMid = AttenuationShapes.planckBrighteningDbPerK(mid, LAMP_COLOUR_TEMPERATURE_K);
        double brightSpan = lampDriftDbPerK(first, last);
        for (int i = 0; i < n; i++) {
            double w = grid.wavelengthNm(i);
            oh[i] = ohScale * AttenuationShapes.ohAbsorptionDbPerKmPerPpm(w);
            h2[i] = h2Scale * AttenuationShapes.hydrogenBandShape(w, HYDROGEN_2420_RELATIVE);
            dark[i] = darkScale * AttenuationShapes.radiationDarkeningShape(w);
            // a hotter lamp brightens the short end most: the loss it hides rises toward long wavelengths
            drift[i] = (brightMid - AttenuationShapes.planckBrighteningDbPerK(w, LAMP_COLOUR_TEMPERATURE_K))
                    / brightSpan;
        }
        List<Column> out = new ArrayList<>();
        out.add(new Column(Signature.FLAT_EXCESS, rowsOf(flat, rows), flat, mid));
        addIfObservable(out, new Column(Signature.OH_BANDS, rowsOf(oh, rows), oh, ohRef));
        addIfObservable(out, new Column(Signature.HYDROGEN, rowsOf(h2, rows), h2,
                AttenuationShapes.HYDROGEN_BAND_1240_NM));
        addIfObservable(out, new Column(Signature.DARKENING, rowsOf(dark, rows), dark, first));
        out.add(new Column(Signature.REFERENCE_DRIFT, rowsOf(drift, rows), drift, last));
        return out;
    }

    /**
     * A colour-temperature change moves the whole lamp spectrum, not only its tilt: Planck's law ties
     * a level to each fitted tilt. The fit uses the centred drift shape (so that flat and drift stay
     * apart in the collinearity report); afterwards the lamp is credited with its own level, and only
     * what is left is a flat excess. Without this a cooler lamp reads as a connector or bend fault.
     * A small tilt may be model misfit, and its level (1.2–1.6 times the tilt) would turn scatter
     * into a flat finding, so a tilt under the reporting size is credited only where that brings the
     * flat term nearer zero.
     */
    private static List<Column> creditLampLevel(List<Column> columns, double[] x, WavelengthGrid grid, int[] rows,
                                                double minReportDb) {
        int flat = -1;
        int drift = -1;
        for (int j = 0; j < columns.size(); j++) {
            flat = columns.get(j).signature == Signature.FLAT_EXCESS ? j : flat;
            drift = columns.get(j).signature == Signature.REFERENCE_DRIFT ? j : drift;
        }
        if (flat < 0 || drift < 0) {
            return columns;
        }
        double tiltPeak = 0;
        for (double v : columns.get(drift).values) {
            tiltPeak = Math.max(tiltPeak, Math.abs(x[drift] * v));
        }
        double mid = 0.5 * (grid.firstNm() + grid.lastNm());
        // the uncentred shape is −p(λ)/S; the fitted centred one is −p(λ)/S + p(mid)/S
        double levelPerTilt = AttenuationShapes.planckBrighteningDbPerK(mid, LAMP_COLOUR_TEMPERATURE_K)
                / lampDriftDbPerK(grid.firstNm(), grid.lastNm());
        double creditedFlat = x[flat] + x[drift] * levelPerTilt;
        // credited when the tilt is reportable, or half that and the lamp then explains the level
        // better than a flat excess does (the simpler reading; design choice)
        boolean credit = tiltPeak >= minReportDb
                || (tiltPeak >= 0.5 * minReportDb && Math.abs(creditedFlat) < Math.abs(x[flat]));
        if (!credit) {
            return columns;
        }
        x[flat] = creditedFlat;
        Column c = columns.get(drift);
        double[] onGrid = c.onGrid.clone();
        for (int i = 0; i < onGrid.length; i++) {
            onGrid[i] -= levelPerTilt;
        }
        List<Column> out = new ArrayList<>(columns);
        // ranked by its tilt alone: the level it carries is shared with the flat term
        out.set(drift, new Column(c.signature, rowsOf(onGrid, rows), onGrid, c.atNm, c.values));
        return out;
    }

    private static double[] rowsOf(double[] onGrid, int[] rows) {
        double[] v = new double[rows.length];
        for (int r = 0; r < rows.length; r++) {
            v[r] = onGrid[rows[r]];
        }
        return v;
    }

    /** dB of tilt across {@code firstNm}–{@code lastNm} per kelvin of lamp colour-temperature rise. */
    static double lampDriftDbPerK(double firstNm, double lastNm) {
        return AttenuationShapes.planckBrighteningDbPerK(firstNm, LAMP_COLOUR_TEMPERATURE_K)
                - AttenuationShapes.planckBrighteningDbPerK(lastNm, LAMP_COLOUR_TEMPERATURE_K);
    }

    /** A band shape only enters the fit where the measured range shows a real part of it. */
    private static void addIfObservable(List<Column> out, Column c) {
        double max = 0;
        for (double v : c.values) {
            max = Math.max(max, Math.abs(v));
        }
        if (max >= 0.05) {
            out.add(c);
        }
    }

    /** The OH band the amount is stated at: 1240 nm if the grid holds it, else the first band it holds. */
    static double ohReferenceNm(WavelengthGrid grid) {
        if (grid.covers(1240)) {
            return 1240;
        }
        for (OhBand band : AttenuationShapes.SILICA_OH_BANDS) {
            if (grid.covers(band.centerNm())) {
                return band.centerNm();
            }
        }
        return AttenuationShapes.SILICA_OH_BANDS.get(0).centerNm();
    }

    private Finding finding(Column c, double amount, double share, PathEvidence evidence, MeasuredRange range,
                            WavelengthGrid grid) {
        return switch (c.signature) {
            case FLAT_EXCESS -> FlatExcessRanking.finding(amount, c.atNm, share, evidence);
            case OH_BANDS -> ohFinding(amount / AttenuationShapes.ohAbsorptionDbPerKmPerPpm(c.atNm),
                    StatedAmount.of(range, c.onGrid, ohBandsStrongestFirst()), share, evidence, range);
            case HYDROGEN -> hydrogenFinding(amount, StatedAmount.of(range, c.onGrid, List.of(c.atNm)), share,
                    evidence, range);
            case DARKENING -> darkeningFinding(amount, StatedAmount.of(range, c.onGrid, List.of(c.atNm)), share,
                    evidence, range);
            case REFERENCE_DRIFT -> new Finding(Signature.REFERENCE_DRIFT, List.of(Cause.REFERENCE_DRIFT), amount,
                    c.atNm, share, "", String.format(Locale.ROOT,
                    "loss tilts by %+.1f dB across the range, as a lamp %s by ≈%.0f K in colour temperature"
                            + " (Planck) gives: the lamp drifted since the reference scan;"
                            + " re-take the reference through the patch cord, then the loop scan", amount,
                    amount > 0 ? "hotter" : "cooler",
                    Math.abs(amount / lampDriftDbPerK(grid.firstNm(), grid.lastNm()))));
            case FRINGES -> throw new IllegalStateException("fringes are not a fitted column");
        };
    }

    /** The silica OH bands, strongest per ppm first: an OH excess is stated at its strongest measured band. */
    static List<Double> ohBandsStrongestFirst() {
        return AttenuationShapes.SILICA_OH_BANDS.stream()
                .sorted(Comparator.comparingDouble(OhBand::peakDbPerKmPerPpm).reversed())
                .map(OhBand::centerNm).toList();
    }

    private static Finding ohFinding(double ppmKm, StatedAmount at, double share, PathEvidence evidence,
                                     MeasuredRange range) {
        double amount = ppmKm * AttenuationShapes.ohAbsorptionDbPerKmPerPpm(at.atNm());
        double highOhPpm = SilicaFiberGrade.HIGH_OH.typicalOhPpm();
        // the segment whose length would need the most typical high-OH content to explain it
        PathEvidence.SegmentEvidence suspect = evidence.segments().stream()
                .min(Comparator.comparingDouble(seg -> Math.abs(Math.log(ppmKm / (seg.lengthM() * 1e-3) / highOhPpm))))
                .orElseThrow();
        double impliedPpm = ppmKm / (suspect.lengthM() * 1e-3);
        String bound = at.atLeast() ? "at least " : "≈";
        String growth = evidence.hydrogenService()
                ? " The point is in hydrogen service: OH can also grow where hydrogen reacts with hot glass."
                : "";
        String text = String.format(Locale.ROOT,
                "%s%.1f dB OH-band excess at %.0f nm, the strongest OH band measured (%s%.2f ppm·km of OH):"
                        + " a high-OH fiber where a low-OH one belongs; if it is one cable, %s (%.1f m) would hold"
                        + " %s%.0f ppm OH: check its label and grade.%s%s",
                bound, amount, at.atNm(), bound, ppmKm, suspect.label(), suspect.lengthM(), bound, impliedPpm,
                growth, lowerBoundReason(at, range));
        return new Finding(Signature.OH_BANDS, List.of(Cause.HIGH_OH_FIBER), amount, at.atNm(), share,
                suspect.label(), text, at.atLeast());
    }

    /** Why an amount is only a lower bound, as a closing sentence, or nothing when it is not. */
    static String lowerBoundReason(StatedAmount at, MeasuredRange range) {
        if (!at.atLeast()) {
            return "";
        }
        String where = at.unmeasuredNm().stream()
                .map(nm -> String.format(Locale.ROOT, "%.0f nm is %s", nm, range.whyNotMeasured(nm)))
                .collect(Collectors.joining("; "));
        return " Only a lower bound: this shape is stronger where nothing was measured, so the fit saw only its"
                + " weaker part: " + where + ".";
    }

    private static Finding hydrogenFinding(double x, StatedAmount at, double share, PathEvidence evidence,
                                           MeasuredRange range) {
        double amount = x * at.shapeValue();
        String service = evidence.hydrogenService()
                ? "the point is recorded in hydrogen service"
                : "the point is not recorded in hydrogen service: look for a hydrogen source near the route";
        String hot = evidence.processTemperatureC().isPresent()
                ? String.format(Locale.ROOT, " at %.0f °C", evidence.processTemperatureC().getAsDouble()) : "";
        String text = String.format(Locale.ROOT,
                "%s%.1f dB hydrogen-band excess at %.0f nm: hydrogen darkening of the fiber near the probe%s;"
                        + " %s. Plan a hydrogen-resistant (carbon-coated) fiber for the probe tail; the loss recedes"
                        + " only slowly if hydrogen is removed.%s", at.atLeast() ? "at least " : "≈", amount,
                at.atNm(), hot, service, lowerBoundReason(at, range));
        String tails = String.join(" and ", evidence.probeTails());
        return new Finding(Signature.HYDROGEN, List.of(Cause.HYDROGEN_DARKENING), amount, at.atNm(), share,
                evidence.probeTails().isEmpty() ? "" : evidence.probeTails().get(0), text + " Fiber nearest the probe: "
                + tails + ".", at.atLeast());
    }

    private static Finding darkeningFinding(double x, StatedAmount at, double share, PathEvidence evidence,
                                            MeasuredRange range) {
        double amount = x * at.shapeValue();
        String longest = evidence.longestSegment().label();
        String text = String.format(Locale.ROOT,
                "%s%.1f dB excess at %.0f nm rising toward short wavelengths: radiation or solarization"
                        + " darkening; check the dose history of %s and whether the lamp's UV reaches the fiber.%s",
                at.atLeast() ? "at least " : "≈", amount, at.atNm(), longest, lowerBoundReason(at, range));
        return new Finding(Signature.DARKENING, List.of(Cause.RADIATION_DARKENING), amount, at.atNm(), share,
                longest, text, at.atLeast());
    }

    private static Finding fringeFinding(FringeReport f, PathEvidence evidence) {
        List<PathEvidence.JointEvidence> suspects = fringeSuspects(evidence);
        String joint = suspects.isEmpty() ? "" : suspects.get(0).label();
        String where = suspects.isEmpty()
                ? "; no joint on record has an air gap: look for a cracked fiber end or a loose probe window"
                : "; re-mate the air-gap joints starting with " + suspects.stream()
                        .map(PathEvidence.JointEvidence::label).collect(Collectors.joining(", "));
        String text = String.format(Locale.ROOT,
                "fringes of %.2f dB peak to peak every %.0f cm⁻¹ left after the fit: an air gap or crack of ≈%.0f µm"
                        + " acting as an etalon (a ripple this size can upset a chemometric model)%s",
                f.peakToPeakDb(), f.periodCm(), f.gapUm(), where);
        return new Finding(Signature.FRINGES, List.of(Cause.AIR_GAP), f.amplitudeDb(), Double.NaN,
                0, joint, text);
    }

    /**
     * The joints that can hold an air gap, most likely first: graded dirty or damaged, then never
     * inspected, then the rest (a gap opens where a connector was disturbed; design choice).
     */
    static List<PathEvidence.JointEvidence> fringeSuspects(PathEvidence evidence) {
        return evidence.joints().stream().filter(PathEvidence.JointEvidence::airGap)
                .sorted(Comparator.comparingInt(j -> j.grade().needsAction() ? 0
                        : j.grade() == org.strandbook.site.InspectionGrade.NOT_INSPECTED ? 1 : 2))
                .toList();
    }

    /**
     * Pairs of look-alike shapes over the whole basis, and each finding whose term the other terms
     * the fit actually used (non-zero coefficients) largely reproduce: a term held at zero by the
     * non-negativity bound took no part in the estimate and cannot have made it uncertain.
     */
    private static List<String> collinearNotes(LeastSquaresProblem problem, List<Column> columns,
                                               List<Finding> findings, double[][] a, double[] b, double[] sigma,
                                               double[] x) {
        List<String> notes = new ArrayList<>();
        CollinearityReport report = CollinearityReport.of(problem);
        int[] active = java.util.stream.IntStream.range(0, columns.size()).filter(j -> x[j] != 0).toArray();
        double[][] activeColumns = new double[active.length][];
        for (int c = 0; c < active.length; c++) {
            activeColumns[c] = a[active[c]];
        }
        CollinearityReport used = active.length == 0 ? report
                : CollinearityReport.of(LeastSquaresProblem.ofColumns(activeColumns, b).withRowSigmas(sigma));
        for (Finding f : findings) {
            for (int c = 0; c < active.length; c++) {
                double vif = used.varianceInflation(c);
                if (columns.get(active[c]).signature == f.signature() && vif > INFLATION_LIMIT) {
                    notes.add(String.format(Locale.ROOT, "the %s finding rests on a shape largely in the span of"
                                    + " the other fitted terms over the measured range (variance inflation %.0f,"
                                    + " condition number %.0f): its amount is uncertain; confirm it with the records"
                                    + " or a fresh reference scan", words(f.signature()), vif, used.conditionNumber()));
                }
            }
        }
        boolean flatFound = findings.stream().anyMatch(f -> f.signature() == Signature.FLAT_EXCESS);
        for (ColumnPair pair : report.pairsAbove(COLLINEAR_COSINE)) {
            notes.add(String.format(Locale.ROOT, "%s and %s look alike over the measured range (cos %.2f):"
                            + " the spectrum alone cannot tell them apart",
                    words(columns.get(pair.first()).signature), words(columns.get(pair.second()).signature),
                    pair.cosine()));
        }
        if (flatFound) {
            notes.add("a dirty connector and a tight bend both give a wavelength-flat excess for large cores"
                    + " (Gloge 1972): the workbook's inspection grades and bend records rank them");
        }
        return notes;
    }

    private static String words(Signature s) {
        return s.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    private static Shortfall shortfall(WavelengthGrid grid, int[] rows, double[] deviationDb, double[] predictedLossDb) {
        double[] nm = new double[rows.length];
        double[] predicted = new double[rows.length];
        for (int r = 0; r < rows.length; r++) {
            nm[r] = grid.wavelengthNm(rows[r]);
            predicted[r] = predictedLossDb[rows[r]];
        }
        return Shortfall.of(nm, deviationDb, predicted);
    }

    private static int[] usableRows(boolean[] usable) {
        int n = 0;
        for (boolean u : usable) {
            n += u ? 1 : 0;
        }
        int[] rows = new int[n];
        int k = 0;
        for (int i = 0; i < usable.length; i++) {
            if (usable[i]) {
                rows[k++] = i;
            }
        }
        return rows;
    }

    private static double[] fill(int n, double v) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, v);
        return a;
    }

    private static double rms(double[] r) {
        double s = 0;
        for (double v : r) {
            s += v * v;
        }
        return Math.sqrt(s / r.length);
    }

    private static double median(double[] v) {
        double[] c = v.clone();
        java.util.Arrays.sort(c);
        return c[c.length / 2];
    }

    private static int indexOf(List<Column> columns, Signature signature) {
        for (int j = 0; j < columns.size(); j++) {
            if (columns.get(j).signature == signature) {
                return j;
            }
        }
        return -1;
    }

    private static double[] scaled(double[] shape, double coefficient) {
        double[] out = new double[shape.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = coefficient * shape[i];
        }
        return out;
    }
}
