package org.strandbook.dossier;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;

import org.strandbook.evaluation.Status;
import org.strandbook.evaluation.SubBands;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.SignedDecimal;

/**
 * The dossier's fixed wording and how it writes numbers and times in text: always with a decimal
 * point ({@link Locale#ROOT}) and in UTC, whatever the machine's settings.
 */
final class DossierText {

    private static final DateTimeFormatter TIME =
            DateTimeFormatter.ofPattern("uuuu-MM-dd HH:mm", Locale.ROOT).withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("uuuu-MM-dd", Locale.ROOT);
    /** The audit trail's stored form of a time (ISO 8601, milliseconds, UTC), which its hashes cover. */
    private static final DateTimeFormatter STORED =
            DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSS'Z'", Locale.ROOT).withZone(ZoneOffset.UTC);

    private DossierText() {
    }

    static String time(Instant t) {
        return TIME.format(t) + " UTC";
    }

    static String date(Instant t) {
        return DATE.format(t.atOffset(ZoneOffset.UTC));
    }

    static String date(LocalDate d) {
        return DATE.format(d);
    }

    static String storedTime(Instant t) {
        return STORED.format(t);
    }

    static String decimal(double value, int digits) {
        return String.format(Locale.ROOT, "%." + digits + "f", value);
    }

    static String signed(double value, int digits) {
        return SignedDecimal.of(value, digits);
    }

    static String words(Enum<?> value) {
        return value.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    /**
     * Lines {@code text} takes when wrapped at {@code charsPerLine} (greedy, at spaces; a word longer
     * than a line is broken). Spreadsheet programs keep a written row's height on opening, so the
     * writer sets the height of rows whose text wraps from this count.
     */
    static int wrappedLines(String text, double charsPerLine) {
        int width = Math.max(1, (int) Math.floor(charsPerLine));
        if (text.length() <= width && text.indexOf('\n') < 0) {
            return 1;
        }
        int lines = 1;
        int used = 0;
        int i = 0;
        int n = text.length();
        while (i < n) {
            char c = text.charAt(i);
            if (c == '\n') {
                lines++;
                used = 0;
                i++;
                continue;
            }
            if (c == ' ') {
                i++;
                if (used > 0) {
                    used++;
                }
                continue;
            }
            int end = i;
            while (end < n && text.charAt(end) != ' ' && text.charAt(end) != '\n') {
                end++;
            }
            int len = end - i;
            if (used > 0 && used + len > width) {
                lines++;
                used = 0;
            }
            while (len > width) {
                lines++;
                len -= width;
            }
            used += len;
            i = end;
        }
        return lines;
    }

    static String statusCount(long count, Status status) {
        return count + " " + status.label();
    }

    static final List<String> CAUTIONS = List.of(
            "Never look into a fiber end, connector, adapter or probe window while a light source may be on:"
                    + " treat every fiber as live, and never use a magnifier or inspection scope that is not made"
                    + " for live fibers. Analyzer lamps and lasers can harm the eye, and part of their light is"
                    + " invisible infrared (IEC 60825-1 and IEC 60825-2 for lasers and optical-fiber systems,"
                    + " IEC 62471 for lamps).",
            "Cleaved and broken fiber leaves glass shards that pierce the skin and are hard to see: wear safety"
                    + " glasses, work over a dark mat, collect offcuts with tweezers into a sharps container, and"
                    + " keep food and drink away from the work area.",
            "Optical radiation can ignite an explosive atmosphere. Light sources and fibers that run into a"
                    + " classified hazardous area must meet IEC 60079-28 (protection types op is, op pr, op sh) and"
                    + " the site's hazardous-area rules; the point register marks such points.",
            "A probe sits in a pipe or vessel under pressure and temperature, often with toxic or flammable"
                    + " contents. Never loosen a probe or its fitting without isolation, a permit to work and the"
                    + " plant's procedures; that is work for the plant's licensed fitters.",
            "This dossier records measurements; it does not replace local codes, the plant's permit-to-work"
                    + " system, the equipment makers' instructions or licensed practice, which always take"
                    + " precedence.");

    static final List<String> METHOD = List.of(
            "Loss was measured after the one-cord reference method of the IEC 61280-4-1 family (installed"
                    + " multimode cabling), applied at every wavelength of the analyzer: the lamp is measured"
                    + " through a short reference patch cord at the analyzer (reference scan) and then through the"
                    + " whole loop, send leg, probe and return leg (loop scan); each is corrected by a dark scan"
                    + " taken with the lamp blocked. Loss (dB) = −10·log10((loop − dark) / (reference − dark)).",
            "The reference scan divides out the lamp, the analyzer's own launch and detector faces and the"
                    + " reference cord, so the loss reported is that of the installed loop. The probe was measured"
                    + " as found; its process contents add to the loss.",
            "Pairing of scans: " + Placeholder.PAIRING_RULE.token() + ".",
            "Detector counts grow with the integration time and, where a scan file records co-added scans,"
                    + " with their number; so do dark counts. Loop and reference are therefore compared as"
                    + " (scan − dark) / (integration time × co-added scans), each with a dark of its own"
                    + " integration time. Where the integration time of the loop, the reference or a dark is not"
                    + " recorded, the two cannot be shown to be on one scale: the bands are marked "
                    + Status.REVIEW.label() + " with that reason and are not judged, and the scan is left out of"
                    + " the trend.",
            "Wavelengths where the loop or the reference signal lies within a few noise widths of its dark"
                    + " level could not be measured; the Spectra sheet leaves them empty and gives the reason.",
            "A saturated detector or clipped converter shows a flat top (readings held at full scale, runs of"
                    + " equal highest counts, or a top flattened below full scale with its flanks still climbing);"
                    + " a clipped reference would make the loop look better than it is. Such wavelengths are"
                    + " left out with their reason (e.g. reference saturated: shorten the integration time and"
                    + " re-take it) and never enter the fit; a band mostly clipped, or a measurement clipped over"
                    + " most of its range, is not judged.",
            "Predicted loss comes from the recorded path: fiber attenuation (Rayleigh scattering, infrared and"
                    + " OH absorption in silica, or the maker's datasheet), Gloge bend loss for recorded bends (the"
                    + " tightest bend of a segment, charged once), joint allowances (the entered loss, else the"
                    + " connector type's typical loss) and Fresnel reflection at probe windows (Sellmeier index),"
                    + " evaluated on a " + Placeholder.GRID_STEP.token() + " nm wavelength grid.");

    static final List<String> ACCEPTANCE_RULES = List.of(
            "Each band of interest of each point is judged on the latest paired loop scan. "
                    + Status.FAIL.label() + ": no light measured in the band; the highest measured loss exceeds"
                    + " the analyzer's allowed loss; the mean deviation (measured − predicted) exceeds the"
                    + " tolerance; or a local excess exceeds " + Placeholder.LOCAL_FAIL.token() + " tolerances.",
            Status.REVIEW.label() + ": less than " + Placeholder.MIN_MEASURED.token() + " % of the band could"
                    + " be measured; a local excess exceeds twice the tolerance; the loop loses less than"
                    + " predicted by more than the tolerance (a bad reference or wrong records); the margin is"
                    + " smaller than the tolerance; or no loop scan could be paired. " + Status.PASS.label()
                    + ": otherwise.",
            "The tolerance is the point's own, else the site default of " + Placeholder.DEFAULT_TOLERANCE.token()
                    + " dB. A point's status is that of its worst band. The margin is the analyzer's allowed"
                    + " loss minus the highest measured loss in the band.",
            "The rules above are those of the fixed tolerance. The decision rule in force for this dossier: "
                    + Placeholder.DECISION_RULE.token());

    /**
     * The site's decision rule as the dossier states it, in the terms of ILAC-G8:09/2019 (decision
     * rules and statements of conformity) and JCGM 106:2012 (acceptance zone, guard band).
     */
    static String decisionRule(DecisionRule rule, double toleranceDb) {
        if (!rule.onInterval()) {
            return "fixed tolerance, a simple acceptance rule in the sense of ILAC-G8:09/2019 (guard band w = 0):"
                    + " the measurement uncertainty is not taken into account. A band conforms when its mean"
                    + " measured loss exceeds the predicted loss by no more than the tolerance (site default "
                    + decimal(toleranceDb, 2) + " dB).";
        }
        String pct = rule.percent();
        return "coverage interval, a decision rule with a guard band in the sense of ILAC-G8:09/2019 and"
                + " JCGM 106:2012 (clause 8: acceptance zone, guard band). The specified tolerance interval of a"
                + " band is the prediction's " + pct + " % coverage interval (Monte Carlo propagation of the input"
                + " uncertainties, JCGM 101:2008), widened in quadrature by the expanded uncertainty of the"
                + " measurement itself, U = k·u with k for " + pct + " % coverage (detector noise from the dark"
                + " scans and the repeatability of the reference). The acceptance zone is that widened interval:"
                + " a band whose mean measured − predicted loss lies in it is declared "
                + Status.PASS.label() + ". A guard band w = " + decimal(rule.guardBandDb(), 2) + " dB lies beyond"
                + " its upper limit: a result within it is " + Status.REVIEW.label() + " (conformity can be"
                + " neither shown nor rejected at the stated coverage); a result beyond limit + w lies in the"
                + " rejection zone and is " + Status.FAIL.label() + ". A loss below the widened interval is "
                + Status.REVIEW.label() + " (a reference or record problem). The worst sub-band of at most "
                + decimal(SubBands.MAX_WIDTH_NM, 0) + " nm of each band is held to the same limits. A measured"
                + " loss above the analyzer's allowed loss is " + Status.FAIL.label() + "; a margin smaller than U"
                + " + w is " + Status.REVIEW.label() + ".";
    }

    static final List<String> TREND_METHOD = List.of(
            "Each band is cut into sub-bands of at most " + decimal(SubBands.MAX_WIDTH_NM, 0) + " nm. In every"
                    + " sub-band the highest measured loss of each scan is trended against time by the Theil–Sen"
                    + " slope with Sen's confidence interval, and its margin (allowed loss minus that loss at the"
                    + " latest scan) is extended along its own slope. The sub-band whose margin reaches zero"
                    + " first (or, when none is shrinking, the one with the least margin) is the band's driving"
                    + " range: its slope, date and history are the ones shown. A band's mean would hide loss that"
                    + " grows at one place in the band and date the run-out years too late.",
            "Steps and single outliers between consecutive scans of the driving range are flagged when larger"
                    + " than the scan-to-scan noise.",
            "The forecast extends the present margin along the slope and its confidence limits to the date the"
                    + " margin would reach zero. It is an extrapolation for planning maintenance, not a guarantee.");

    static final List<String> LIMITS = List.of(
            "This dossier covers the optical light paths only. It certifies neither hazardous-area compliance,"
                    + " nor pressure integrity, nor the analyzer's chemometric performance.",
            "Times are UTC. Numbers use a decimal point; units are in every column header.");

    static final List<String> AUDIT_CHECK = List.of(
            "The Audit log appendix lists every change made to the workbook. Each row's hash is the SHA-256"
                    + " (FIPS 180-4) of the previous row's hash followed by the row's fields No., time, user,"
                    + " action, table, row key, before, after and row SHA-256, each written as its length in UTF-8"
                    + " bytes in decimal, a colon and its text; an empty cell (no value) is written as a single"
                    + " '-'. The first row's previous hash is 64 zeros. The last row's hash must equal the audit"
                    + " head on the cover.");
}
