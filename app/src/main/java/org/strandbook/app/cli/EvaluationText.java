package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import org.strandbook.diagnosis.Finding;
import org.strandbook.diagnosis.FringeReport;
import org.strandbook.diagnosis.Signature;
import org.strandbook.evaluation.BandInterval;
import org.strandbook.evaluation.BandTrend;
import org.strandbook.evaluation.BandUncertainty;
import org.strandbook.evaluation.BandVerdict;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.evaluation.SubBands;
import org.strandbook.evaluation.Urgency;
import org.strandbook.handover.StepAttribution;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.SignedDecimal;
import org.strandbook.throughput.MaskedRange;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepEvent;
import org.strandbook.uncertainty.BasisKind;
import org.strandbook.uncertainty.BudgetRow;
import org.strandbook.uncertainty.PathUncertainty;

/** Evaluations and trends as the command line prints them: aligned text with units, or JSON. */
final class EvaluationText {

    private EvaluationText() {
    }

    static String db(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.2f", v) : "—";
    }

    /** One line per point: tag, status, worst band, margin, finding. */
    static void summary(SiteEvaluation site, PrintWriter out) {
        TextTable t = new TextTable(new String[] {"Point", "Status", "Worst band", "Margin", "Finding"},
                new String[] {"", "", "", "(dB)", ""}).leftAligned(0, 1, 2, 4);
        for (PointEvaluation e : site.points()) {
            Optional<BandVerdict> worst = e.worstBand();
            t.row(e.point().tag(), e.status().label(), worst.map(v -> v.band().name()).orElse("—"),
                    worst.map(v -> db(v.marginDb())).orElse("—"), e.shortFinding());
        }
        t.print(out);
        out.println();
        for (PointEvaluation e : site.points()) {
            if (e.status() != org.strandbook.evaluation.Status.PASS) {
                out.println(e.point().tag() + ": " + e.finding());
            }
        }
        site.problems().forEach(p -> out.println("not evaluated: " + p));
        out.println("Decision rule: " + site.decisionRule().describe(site.site().defaultToleranceDb()));
        out.printf(Locale.ROOT, "%d point%s: %d pass, %d review, %d fail. Pairing rule: %s%n", site.points().size(),
                site.points().size() == 1 ? "" : "s",
                site.count(org.strandbook.evaluation.Status.PASS), site.count(org.strandbook.evaluation.Status.REVIEW),
                site.count(org.strandbook.evaluation.Status.FAIL), site.pairingRule());
    }

    /** The bands, findings and masked ranges of one point. */
    static void details(PointEvaluation e, PrintWriter out) {
        out.println();
        out.println(e.point().tag() + " — " + e.point().service() + ": " + e.status().label());
        e.latest().ifPresent(p -> out.printf(Locale.ROOT, "  loop scan %d taken %s; reference %d, darks %d and %d%n",
                p.loop().id(), p.loop().takenAt(), p.reference().id(), p.loopDark().id(), p.referenceDark().id()));
        e.latest().ifPresent(p -> out.println("  integration: " + p.exposure().describeNormalisation()));
        TextTable bands = new TextTable(
                new String[] {"Band", "From", "To", "Status", "Predicted", "Measured max", "Mean dev.", "Worst dev.",
                    "Margin", "Reason"},
                new String[] {"", "(nm)", "(nm)", "", "(dB)", "(dB)", "(dB)", "(dB)", "(dB)", ""}).leftAligned(0, 3, 9);
        for (BandVerdict v : e.verdicts()) {
            bands.row(v.band().name(), String.format(Locale.ROOT, "%.0f", v.band().fromNm()),
                    String.format(Locale.ROOT, "%.0f", v.band().toNm()), v.status().label(), db(v.predictedLossDb()),
                    db(v.worstMeasuredLossDb()), db(v.meanDeviationDb()), db(v.worstDeviationDb()), db(v.marginDb()),
                    v.reason());
        }
        bands.print(out);
        for (BandVerdict v : e.verdicts()) {
            e.interval(v.band()).ifPresent(i -> out.printf(Locale.ROOT, "  %s: predicted %.2f dB, %s %% interval"
                    + " %.2f … %.2f dB; measurement ±%.2f dB (u = %.3f dB, repeatability %s); accepted up to %+.2f dB"
                    + " over the prediction, REVIEW to %+.2f dB, FAIL beyond%n", v.band().name(), v.predictedLossDb(),
                    percent(i.coverage()), i.prediction().lowDb(v.predictedLossDb()),
                    i.prediction().highDb(v.predictedLossDb()), i.measurementExpandedDb(),
                    i.measurement().standardUncertaintyDb(), basisWord(i.measurement().repeatabilityBasis()),
                    i.upperDeviationDb(), i.upperDeviationDb() + i.guardBandDb()));
        }
        e.diagnosis().ifPresent(d -> {
            for (Finding f : d.findings()) {
                if (f.signature() == Signature.FRINGES) {
                    out.println("  finding (ripple left after the fit): " + f.text());
                } else {
                    out.printf(Locale.ROOT, "  finding (%.0f %% of the explained deviation): %s%n", f.sharePercent(),
                            f.text());
                }
            }
            if (Double.isFinite(d.residualRmsDb())) {
                out.printf(Locale.ROOT, "  residual after the fit: %.2f dB RMS%n", d.residualRmsDb());
            }
            if (d.findings().isEmpty()) {
                out.println("  finding: " + d.summary());
            }
            d.collinearNotes().forEach(n -> out.println("  note: " + n));
        });
        e.measured().ifPresent(m -> m.maskedRanges().forEach(r -> out.println("  not measured: " + r.description())));
        e.problems().forEach(p -> out.println("  problem: " + p));
    }

    static String json(SiteEvaluation site) {
        StringBuilder b = new StringBuilder();
        b.append("{\"site\":").append(JsonText.string(site.site().name()))
                .append(",\"evaluated_at\":").append(JsonText.string(site.evaluatedAt().toString()))
                .append(",\"pairing_rule\":").append(JsonText.string(site.pairingRule()))
                .append(",\"decision_rule\":").append(json(site.decisionRule(), site.site().defaultToleranceDb()))
                .append(",\"points\":[");
        boolean firstPoint = true;
        for (PointEvaluation e : site.points()) {
            b.append(firstPoint ? "" : ",");
            firstPoint = false;
            b.append("{\"point\":").append(JsonText.string(e.point().tag()))
                    .append(",\"status\":").append(JsonText.string(e.status().name()))
                    .append(",\"worst_band\":").append(e.worstBand().map(v -> JsonText.string(v.band().name()))
                            .orElse("null"))
                    .append(",\"margin_db\":").append(JsonText.number(Urgency.leastMarginDb(e)))
                    .append(",\"finding\":").append(JsonText.string(e.finding()));
            e.latest().ifPresent(p -> b.append(",\"loop_scan_id\":").append(p.loop().id())
                    .append(",\"reference_scan_id\":").append(p.reference().id())
                    .append(",\"loop_dark_scan_id\":").append(p.loopDark().id())
                    .append(",\"reference_dark_scan_id\":").append(p.referenceDark().id())
                    .append(",\"taken_at\":").append(JsonText.string(p.loop().takenAt().toString()))
                    .append(",\"loop_integration_ms\":").append(integrationMs(p.loop().conditions().integrationMs()))
                    .append(",\"reference_integration_ms\":")
                    .append(integrationMs(p.reference().conditions().integrationMs()))
                    .append(",\"loop_co_added\":").append(p.loop().conditions().coAdded())
                    .append(",\"reference_co_added\":").append(p.reference().conditions().coAdded())
                    .append(",\"integration\":").append(JsonText.string(p.exposure().describeNormalisation())));
            List<BandUncertainty> spreads = e.intervals().isEmpty() ? uncertainties(e)
                    : e.intervals().stream().map(BandInterval::prediction).toList();
            b.append(",\"bands\":[");
            for (int i = 0; i < e.verdicts().size(); i++) {
                BandVerdict v = e.verdicts().get(i);
                b.append(i == 0 ? "" : ",").append(json(v, spreads.stream()
                        .filter(u -> u.band().equals(v.band())).findFirst(), e.interval(v.band())));
            }
            b.append(']');
            b.append(",\"findings\":[");
            e.diagnosis().ifPresent(d -> b.append(d.findings().stream().map(EvaluationText::json)
                    .collect(Collectors.joining(","))));
            b.append("],\"residual_rms_db\":").append(JsonText.number(
                    e.diagnosis().map(d -> d.residualRmsDb()).orElse(Double.NaN)));
            b.append(",\"fringes\":").append(e.diagnosis().flatMap(d -> d.fringes()).map(EvaluationText::json)
                    .orElse("null"));
            b.append(",\"diagnosis_notes\":").append(strings(e.diagnosis().map(d -> d.collinearNotes())
                    .orElse(List.of())));
            b.append(",\"masked\":[");
            b.append(e.measured().map(m -> m.maskedRanges().stream().map(EvaluationText::json)
                    .collect(Collectors.joining(","))).orElse(""));
            b.append("],\"problems\":").append(strings(e.problems())).append('}');
        }
        b.append("],\"problems\":").append(strings(site.problems())).append("}\n");
        return b.toString();
    }

    /** Sen's interval of a slope; two readings (as just after a repair) are too few to bound it. */
    private static String slopeInterval(LossTrend trend) {
        if (!trend.slopeIsBounded()) {
            return "too few scans";
        }
        return SignedDecimal.of(trend.lowerSlopeDbPerYear(), 3) + " … " + SignedDecimal.of(trend.upperSlopeDbPerYear(), 3);
    }

    /** A recorded integration time, or null when the scan file did not give one. */
    private static String integrationMs(double ms) {
        return ms > 0 ? JsonText.number(ms) : "null";
    }

    /**
     * The prediction's coverage interval per band; none when the point has no prediction or its
     * inputs cannot be propagated (the point's problems already say why).
     */
    private static List<BandUncertainty> uncertainties(PointEvaluation e) {
        if (e.predicted() == null || e.verdicts().isEmpty()) {
            return List.of();
        }
        try {
            return BandUncertainty.of(e.predicted(), e.verdicts().stream().map(BandVerdict::band).toList(),
                    PathUncertainty.standard());
        } catch (IllegalArgumentException ex) {
            return List.of();
        }
    }

    private static String json(DecisionRule rule, double toleranceDb) {
        return "{\"kind\":" + JsonText.string(rule.kind().code())
                + ",\"name\":" + JsonText.string(rule.kind().words())
                + ",\"coverage\":" + JsonText.number(rule.coverage())
                + ",\"guard_band_db\":" + JsonText.number(rule.guardBandDb())
                + ",\"site_tolerance_db\":" + JsonText.number(toleranceDb)
                + ",\"text\":" + JsonText.string(rule.describe(toleranceDb)) + "}";
    }

    /** The acceptance limits of a band judged on the interval; nulls under the fixed tolerance. */
    private static String limits(BandVerdict v, Optional<BandInterval> interval) {
        return interval.map(i -> ",\"measurement_uncertainty_db\":"
                + JsonText.number(i.measurement().standardUncertaintyDb())
                + ",\"measurement_expanded_db\":" + JsonText.number(i.measurementExpandedDb())
                + ",\"measurement_budget\":" + i.measurement().rows().stream().map(EvaluationText::json)
                        .collect(Collectors.joining(",", "[", "]"))
                + ",\"accept_low_db\":" + JsonText.number(v.predictedLossDb() + i.lowerDeviationDb())
                + ",\"accept_high_db\":" + JsonText.number(v.predictedLossDb() + i.upperDeviationDb())
                + ",\"guard_band_db\":" + JsonText.number(i.guardBandDb()))
                .orElse(",\"measurement_uncertainty_db\":null,\"measurement_expanded_db\":null"
                        + ",\"measurement_budget\":[],\"accept_low_db\":null,\"accept_high_db\":null"
                        + ",\"guard_band_db\":null");
    }

    private static String percent(double coverage) {
        return DecisionRule.percent(coverage);
    }

    private static String basisWord(BasisKind basis) {
        return basis.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    private static String json(BandVerdict v, Optional<BandUncertainty> spread, Optional<BandInterval> limits) {
        String interval = spread.map(u -> ",\"predicted_low_db\":" + JsonText.number(u.lowDb(v.predictedLossDb()))
                + ",\"predicted_high_db\":" + JsonText.number(u.highDb(v.predictedLossDb()))
                + ",\"coverage\":" + JsonText.number(u.atCentre().budget().interval().probability())
                + ",\"predicted_standard_uncertainty_db\":"
                + JsonText.number(u.atCentre().budget().combinedStandardUncertainty())
                + ",\"uncertainty_at_nm\":" + JsonText.number(u.atCentre().wavelengthNm())
                + ",\"uncertainty_budget\":" + u.atCentre().budget().rowsByContribution().stream()
                        .map(EvaluationText::json).collect(Collectors.joining(",", "[", "]")))
                .orElse(",\"predicted_low_db\":null,\"predicted_high_db\":null,\"coverage\":null"
                        + ",\"uncertainty_budget\":[]");
        return "{\"band\":" + JsonText.string(v.band().name())
                + ",\"from_nm\":" + JsonText.number(v.band().fromNm())
                + ",\"to_nm\":" + JsonText.number(v.band().toNm())
                + ",\"status\":" + JsonText.string(v.status().name())
                + ",\"predicted_loss_db\":" + JsonText.number(v.predictedLossDb()) + interval
                + ",\"measured_loss_db\":" + JsonText.number(v.worstMeasuredLossDb())
                + ",\"mean_deviation_db\":" + JsonText.number(v.meanDeviationDb())
                + ",\"worst_deviation_db\":" + JsonText.number(v.worstDeviationDb())
                + ",\"worst_at_nm\":" + JsonText.number(v.worstAtNm())
                + ",\"margin_db\":" + JsonText.number(v.marginDb())
                + ",\"measured_fraction\":" + JsonText.number(v.measuredFraction())
                + limits(v, limits)
                + ",\"reason\":" + JsonText.string(v.reason()) + "}";
    }

    private static String json(BudgetRow r) {
        return "{\"input\":" + JsonText.string(r.input())
                + ",\"unit\":" + JsonText.string(r.unit())
                + ",\"distribution\":" + JsonText.string(r.distribution())
                + ",\"basis\":" + JsonText.string(r.basis().name())
                + ",\"basis_text\":" + JsonText.string(r.basisText())
                + ",\"standard_uncertainty\":" + JsonText.number(r.standardUncertainty())
                + ",\"sensitivity\":" + JsonText.number(r.sensitivity())
                + ",\"contribution_db\":" + JsonText.number(r.contribution())
                + ",\"variance_share\":" + JsonText.number(r.share()) + "}";
    }

    private static String json(Finding f) {
        return "{\"cause\":" + JsonText.string(f.cause().name())
                + ",\"candidates\":" + strings(f.candidates().stream().map(Enum::name).toList())
                + ",\"signature\":" + JsonText.string(f.signature().name())
                + ",\"amount_db\":" + JsonText.number(f.amountDb())
                + ",\"amount_at_least\":" + f.atLeast()
                + ",\"at_nm\":" + JsonText.number(f.atNm())
                + ",\"share_percent\":" + JsonText.number(f.sharePercent())
                + ",\"check_first\":" + JsonText.string(f.checkFirst())
                + ",\"text\":" + JsonText.string(f.text()) + "}";
    }

    private static String json(FringeReport f) {
        return "{\"period_cm\":" + JsonText.number(f.periodCm())
                + ",\"gap_um\":" + JsonText.number(f.gapUm())
                + ",\"peak_to_peak_db\":" + JsonText.number(f.peakToPeakDb())
                + ",\"significance\":" + JsonText.number(f.significance()) + "}";
    }

    private static String json(MaskedRange r) {
        return "{\"from_nm\":" + JsonText.number(r.fromNm()) + ",\"to_nm\":" + JsonText.number(r.toNm())
                + ",\"reason\":" + JsonText.string(r.description()) + "}";
    }

    static String strings(List<String> items) {
        return items.stream().map(JsonText::string).collect(Collectors.joining(",", "[", "]"));
    }

    /** The site's points ranked by urgency, one line per point and band. */
    static void trendTable(SiteEvaluation site, List<MaintenanceAction> actions, PrintWriter out) {
        TextTable t = new TextTable(
                new String[] {"Rank", "Point", "Status", "Band", "Scans", "Driving range", "Slope", "95 % interval",
                    "Steps", "Margin", "Margin runs out"},
                new String[] {"", "", "", "", "", "(nm)", "(dB/year)", "(dB/year)", "", "(dB)", "(date)"})
                .leftAligned(1, 2, 3, 10);
        int rank = 1;
        for (PointEvaluation e : site.points()) {
            for (int b = 0; b < e.trends().size(); b++) {
                BandTrend tr = e.trends().get(b);
                Optional<LossTrend> lt = tr.trend();
                double margin = b < e.verdicts().size() ? e.verdicts().get(b).marginDb() : Double.NaN;
                t.row(b == 0 ? Integer.toString(rank) : "", b == 0 ? e.point().tag() : "",
                        b == 0 ? e.status().label() : "", tr.band().name(),
                        Integer.toString(tr.readings().size()) + (tr.noLight().isEmpty() ? ""
                                : " (+" + tr.noLight().size() + " dark)"),
                        String.format(Locale.ROOT, "%.0f–%.0f", tr.drivingFromNm(), tr.drivingToNm()),
                        lt.map(x -> SignedDecimal.of(x.slopeDbPerYear(), 3)).orElse("—"),
                        lt.map(EvaluationText::slopeInterval).orElse("—"),
                        Integer.toString(tr.steps().size()), db(margin), outlook(tr));
            }
            rank++;
        }
        t.print(out);
        out.println(String.format(Locale.ROOT, "Slope and date follow the highest loss in the driving range: the part of the band (sub-bands of at"
                + " most %.0f nm) whose margin runs out first.", SubBands.MAX_WIDTH_NM));
        for (PointEvaluation e : site.points()) {
            for (BandTrend tr : e.trends()) {
                for (StepEvent s : tr.steps()) {
                    List<MaintenanceAction> here = actionsAt(actions, e.point().tag());
                    out.printf(Locale.ROOT, "event: %s %s: %s of %+.2f dB between %s and %s%s%n", e.point().tag(),
                            tr.band().name(), s.kind().name().toLowerCase(Locale.ROOT), s.stepDb(), s.before(),
                            s.after(), StepAttribution.cause(s, here).map(a -> "; "
                                    + StepAttribution.describe(s, here)).orElse(""));
                }
                if (!tr.noLight().isEmpty()) {
                    out.printf(Locale.ROOT, "event: %s %s: no light returned since %s%n", e.point().tag(),
                            tr.band().name(), tr.noLight().get(0));
                }
            }
        }
    }

    private static String outlook(BandTrend tr) {
        if (!tr.noLight().isEmpty()) {
            return "no light now";
        }
        return tr.outlook().map(o -> switch (o.status()) {
            case ALREADY_EXHAUSTED -> "already used up";
            case PROJECTED -> o.expectedDate().map(Object::toString).orElse("—")
                    + o.earliestDate().map(d -> " (earliest " + d + ")").orElse(" (earliest: not bounded yet)");
            case BEYOND_HORIZON -> "beyond " + (int) MarginForecast.withDefaults().horizonYears() + " years";
            case NOT_SHRINKING -> "not shrinking";
        }).orElse("—");
    }

    /** The actions recorded at one point. */
    private static List<MaintenanceAction> actionsAt(List<MaintenanceAction> actions, String tag) {
        return actions.stream().filter(a -> a.pointTag().equalsIgnoreCase(tag)).toList();
    }

    static String trendJson(SiteEvaluation site, List<MaintenanceAction> actions) {
        StringBuilder b = new StringBuilder("{\"site\":").append(JsonText.string(site.site().name()))
                .append(",\"ranking\":").append(strings(site.points().stream().map(e -> e.point().tag()).toList()))
                .append(",\"points\":[");
        boolean firstPoint = true;
        for (PointEvaluation e : site.points()) {
            b.append(firstPoint ? "" : ",");
            firstPoint = false;
            b.append("{\"point\":").append(JsonText.string(e.point().tag()))
                    .append(",\"status\":").append(JsonText.string(e.status().name()))
                    .append(",\"run_out_date\":").append(Urgency.runOutDate(e).map(d -> JsonText.string(d.toString()))
                            .orElse("null"))
                    .append(",\"bands\":[");
            for (int i = 0; i < e.trends().size(); i++) {
                BandTrend tr = e.trends().get(i);
                b.append(i == 0 ? "" : ",").append("{\"band\":").append(JsonText.string(tr.band().name()))
                        .append(",\"driving_from_nm\":").append(JsonText.number(tr.drivingFromNm()))
                        .append(",\"driving_to_nm\":").append(JsonText.number(tr.drivingToNm()))
                        .append(",\"readings\":[");
                for (int r = 0; r < tr.readings().size(); r++) {
                    LossReading lr = tr.readings().get(r);
                    b.append(r == 0 ? "" : ",").append("{\"taken_at\":").append(JsonText.string(lr.time().toString()))
                            .append(",\"loss_db\":").append(JsonText.number(lr.lossDb())).append('}');
                }
                b.append("],\"no_light\":").append(strings(tr.noLight().stream().map(Object::toString).toList()));
                tr.trend().ifPresentOrElse(lt -> b.append(",\"slope_db_per_year\":").append(JsonText.number(lt.slopeDbPerYear()))
                        .append(",\"slope_low_db_per_year\":").append(JsonText.number(lt.lowerSlopeDbPerYear()))
                        .append(",\"slope_high_db_per_year\":").append(JsonText.number(lt.upperSlopeDbPerYear()))
                        .append(",\"confidence\":").append(JsonText.number(lt.confidenceLevel())),
                        () -> b.append(",\"slope_db_per_year\":null"));
                b.append(",\"steps\":[");
                for (int s = 0; s < tr.steps().size(); s++) {
                    StepEvent st = tr.steps().get(s);
                    b.append(s == 0 ? "" : ",").append("{\"kind\":").append(JsonText.string(st.kind().name()))
                            .append(",\"before\":").append(JsonText.string(st.before().toString()))
                            .append(",\"after\":").append(JsonText.string(st.after().toString()))
                            .append(",\"step_db\":").append(JsonText.number(st.stepDb()));
                    List<MaintenanceAction> here = actionsAt(actions, e.point().tag());
                    StepAttribution.cause(st, here).ifPresent(a -> b.append(",\"cause\":")
                            .append(JsonText.string(StepAttribution.describe(st, here))));
                    b.append('}');
                }
                b.append(']');
                tr.outlook().ifPresent(o -> b.append(",\"forecast\":{\"status\":").append(JsonText.string(o.status().name()))
                        .append(",\"margin_db\":").append(JsonText.number(o.marginDb()))
                        .append(",\"expected_date\":").append(o.expectedDate().map(d -> JsonText.string(d.toString())).orElse("null"))
                        .append(",\"earliest_date\":").append(o.earliestDate().map(d -> JsonText.string(d.toString())).orElse("null"))
                        .append(",\"latest_date\":").append(o.latestDate().map(d -> JsonText.string(d.toString())).orElse("null"))
                        .append('}'));
                b.append('}');
            }
            b.append("]}");
        }
        return b.append("]}\n").toString();
    }
}
