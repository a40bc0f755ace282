package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;

import org.strandbook.optics.Decibel;
import org.strandbook.optics.Fresnel;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.Wavenumber;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.attenuation.SilicaFiberGrade;
import org.strandbook.optics.bend.BendLoss;
import org.strandbook.optics.bend.BendRadiusCheck;
import org.strandbook.optics.bend.GlogeBend;
import org.strandbook.optics.bend.MinimumBendRadius;
import org.strandbook.optics.path.FaceElement;
import org.strandbook.optics.path.FiberSegment;
import org.strandbook.optics.path.FiberSpec;
import org.strandbook.optics.path.LightPath;
import org.strandbook.optics.path.LossBudget;
import org.strandbook.optics.path.Reach;
import org.strandbook.optics.path.SpectralWindow;
import org.strandbook.uncertainty.Allowance;
import org.strandbook.uncertainty.BudgetInputUncertainties;
import org.strandbook.uncertainty.Chance;
import org.strandbook.evaluation.SpreadResolver;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;
import org.strandbook.uncertainty.BasisKind;
import org.strandbook.uncertainty.ElementAllowances;
import org.strandbook.uncertainty.PathAllowances;
import org.strandbook.uncertainty.PathUncertainty;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook fiber}: the one-fiber calculator. One pass through a silica-core multimode
 * step-index fiber: entry face + attenuation × length + exit face + bends, at the wavelengths asked
 * for, and the usable spectral windows for an allowed loss.
 */
@Command(name = "fiber",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Loss of one pass through a silica-core multimode step-index fiber:",
            "entry face + fiber attenuation + exit face + bends.",
            "Faces: Fresnel reflection of a fused-silica core (Malitson 1965) in air.",
            "Attenuation: Strandbook's silica model (Rayleigh, IR edge, UV tail, OH bands),",
            "valid 210-3000 nm.",
            "Bends: Gloge (1972) for a fully filled fiber, a worst case, charged ONCE",
            "however many: the first bend strips the modes its radius cannot guide and",
            "later bends at that radius find them gone; mode coupling that would refill",
            "them is weak over plant lengths (Gloge, Bell Syst. Tech. J. 51, 1767, 1972).",
            "The workbook charges a cable segment's bends the same way.",
            "Usable windows are searched on a 1 nm grid over 400-2500 nm.",
        },
        footer = {"", "Exit status: 0 ok, 2 wrong usage or out-of-range input."})
public final class FiberCommand implements Callable<Integer> {

    /** Usable windows are searched on this grid: 1 nm steps over the NIR/VIS span analyzers use. */
    static final double WINDOW_GRID_START_NM = 400;
    static final double WINDOW_GRID_END_NM = 2500;
    static final int WINDOW_GRID_POINTS = 2101;

    @Spec
    CommandSpec spec;

    @Option(names = "--core-um", required = true, paramLabel = "µm", description = "Core diameter in µm.")
    double coreUm;

    @Option(names = "--clad-um", required = true, paramLabel = "µm", description = "Cladding diameter in µm.")
    double claddingUm;

    @Option(names = "--na", required = true, paramLabel = "NA", description = "Numerical aperture, between 0 and 1.")
    double na;

    @Option(names = "--oh-ppm", defaultValue = "1", paramLabel = "ppm",
            description = "OH content in ppm by weight (default: ${DEFAULT-VALUE}, a typical low-OH fiber; "
                    + "high-OH fibers hold several hundred).")
    double ohPpm;

    @Option(names = "--length-m", required = true, paramLabel = "m", description = "Fiber length in m.")
    double lengthM;

    @Option(names = "--bend-radius-mm", paramLabel = "mm",
            description = "Radius of the routed bends in mm (optional; no bend loss without it).")
    Double bendRadiusMm;

    @Option(names = "--bend-count", defaultValue = "1", paramLabel = "N",
            description = "Number of bends at that radius (default: ${DEFAULT-VALUE}); the first strips the modes "
                    + "the radius cannot guide, so their loss is charged once.")
    int bendCount;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Axis axis;

    static final class Axis {
        @Option(names = "--wavelengths-nm", split = ",", required = true, paramLabel = "nm",
                description = "Wavelengths in nm, comma-separated.")
        double[] wavelengthsNm;

        @Option(names = "--wavenumbers-cm", split = ",", required = true, paramLabel = "cm-1",
                description = "Wavenumbers in cm-1, comma-separated.")
        double[] wavenumbersCm;
    }

    @Option(names = "--allowed-loss-db", defaultValue = "3", paramLabel = "dB",
            description = "Allowed one-pass loss in dB for reach and usable windows (default: ${DEFAULT-VALUE} dB).")
    double allowedLossDb;

    @Option(names = "--chance-within-db", paramLabel = "dB",
            description = "Also give the chance that the fiber stays within this loss at --chance-at-nm, by Monte Carlo "
                    + "(JCGM 101:2008) over the spreads of length, attenuation, OH content and bend radius.")
    Double chanceWithinDb;

    @Option(names = "--chance-at-nm", paramLabel = "nm",
            description = "Wavelength in nm for --chance-within-db (default: 2300, where silica's infrared edge and "
                    + "OH bands make the spread largest in the usual NIR range).")
    Double chanceAtNm;

    @Option(names = "--length-spread", paramLabel = "SPREAD",
            description = "Length tolerance for --chance-within-db, e.g. ±0.5m or ±2% (+/- for ±; u 0.2m for a "
                    + "standard uncertainty); default: the shipped ±2 % or ±0.1 m.")
    String lengthSpread;

    @Option(names = "--attenuation-spread", paramLabel = "SPREAD",
            description = "Attenuation spread for --chance-within-db, e.g. ±10%; default: the shipped ±15 %.")
    String attenuationSpread;

    @Option(names = "--json", description = "Print {\"points\":[...]} as JSON instead of a table.")
    boolean json;

    /** One wavelength's result. */
    record Point(double wavelengthNm, double attenuationDbPerKm, double fiberLossDb, double faceLossDb,
            double bendLossDb, boolean bendClamped, double totalLossDb, double transmittance, double reachM) {
    }

    /** The design question's answer: how likely the fiber stays within an allowed loss. */
    record WithinChance(double allowedLossDb, double wavelengthNm, double predictedLossDb, Chance chance,
                        ElementAllowances.Fiber spreads) {
    }

    /** Default wavelength of the design question: design choice (the usual NIR range's lossy end). */
    static final double DEFAULT_CHANCE_AT_NM = 2300;

    @Override
    public Integer call() {
        validate();
        SilicaAttenuation attenuation = SilicaAttenuation.of(SilicaFiberGrade.ofOhPpm(ohPpm), ohPpm);
        FiberSpec fiber = FiberSpec.silicaCore(coreUm, claddingUm, na, attenuation);
        double[] wavelengths = requestedWavelengthsNm();
        for (double w : wavelengths) {
            try {
                attenuation.validRange().require(w, "the silica attenuation model");
            } catch (IllegalArgumentException e) {
                throw new UsageProblem(e.getMessage());
            }
        }
        List<Point> points = new ArrayList<>(wavelengths.length);
        for (double w : wavelengths) {
            points.add(point(fiber, w));
        }
        WithinChance chance = chanceWithinDb == null ? null : withinChance(fiber);
        BendRadiusCheck radiusCheck = bendRadiusMm == null ? null : MinimumBendRadius.check(claddingUm, bendRadiusMm);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            printJson(out, points, chance);
            if (radiusCheck != null && !radiusCheck.ok()) {
                spec.commandLine().getErr().println("strandbook: note: " + radiusCheck.message());
            }
        } else {
            printTable(out, fiber, points, radiusCheck);
            if (chance != null) {
                printChance(out, chance);
            }
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }

    private Point point(FiberSpec fiber, double wavelengthNm) {
        double att = fiber.attenuation().attenuationDbPerKm(wavelengthNm);
        double fiberDb = att * lengthM * 1e-3;
        double coreIndex = fiber.coreMaterial().refractiveIndex(wavelengthNm);
        double faceDb = Fresnel.faceLossDb(coreIndex, 1.0);
        double bendDb = 0;
        boolean clamped = false;
        if (bendRadiusMm != null && bendCount > 0) {
            BendLoss b = GlogeBend.lossPerBend(coreUm, na, coreIndex, bendRadiusMm, wavelengthNm);
            bendDb = GlogeBend.chargedBends(bendCount) * b.lossDb();
            clamped = b.clamped();
        }
        double total = faceDb + fiberDb + faceDb + bendDb;
        double room = allowedLossDb - 2 * faceDb - bendDb;
        double reach = room <= 0 ? 0 : room / (att * 1e-3);
        return new Point(wavelengthNm, att, fiberDb, faceDb, bendDb, clamped, total,
                Decibel.transmittanceFromLossDb(total), reach);
    }

    private void validate() {
        requireFinite(coreUm, "--core-um");
        requireFinite(claddingUm, "--clad-um");
        requireFinite(na, "--na");
        requireFinite(ohPpm, "--oh-ppm");
        requireFinite(lengthM, "--length-m");
        requireFinite(allowedLossDb, "--allowed-loss-db");
        if (!(coreUm > 0)) {
            throw new UsageProblem("--core-um must be positive, was " + coreUm);
        }
        if (!(claddingUm > coreUm)) {
            throw new UsageProblem("--clad-um " + claddingUm + " must exceed --core-um " + coreUm);
        }
        if (!(na > 0 && na < 1)) {
            throw new UsageProblem("--na must lie between 0 and 1 exclusive, was " + na);
        }
        if (ohPpm < 0) {
            throw new UsageProblem("--oh-ppm must not be negative, was " + ohPpm);
        }
        if (lengthM < 0) {
            throw new UsageProblem("--length-m must not be negative, was " + lengthM);
        }
        if (allowedLossDb < 0) {
            throw new UsageProblem("--allowed-loss-db must not be negative, was " + allowedLossDb);
        }
        if (bendRadiusMm != null) {
            requireFinite(bendRadiusMm, "--bend-radius-mm");
            if (!(bendRadiusMm > 0)) {
                throw new UsageProblem("--bend-radius-mm must be positive, was " + bendRadiusMm);
            }
        }
        if (bendCount < 0) {
            throw new UsageProblem("--bend-count must not be negative, was " + bendCount);
        }
        if (chanceWithinDb != null) {
            requireFinite(chanceWithinDb, "--chance-within-db");
            if (chanceWithinDb < 0) {
                throw new UsageProblem("--chance-within-db must not be negative, was " + chanceWithinDb);
            }
        }
        if (chanceWithinDb == null && (lengthSpread != null || attenuationSpread != null)) {
            throw new UsageProblem("--length-spread and --attenuation-spread need --chance-within-db");
        }
        if (chanceAtNm != null) {
            requireFinite(chanceAtNm, "--chance-at-nm");
            if (chanceWithinDb == null) {
                throw new UsageProblem("--chance-at-nm needs --chance-within-db");
            }
        }
        if (bendRadiusMm == null && spec.commandLine().getParseResult().hasMatchedOption("--bend-count")) {
            throw new UsageProblem("--bend-count needs --bend-radius-mm");
        }
    }

    /**
     * The same one-pass path as the table, on a one-wavelength grid, through the engine that gives
     * the workbook's coverage intervals; the faces carry no spread (Fresnel with a known index).
     */
    private WithinChance withinChance(FiberSpec fiber) {
        double atNm = chanceAtNm == null ? DEFAULT_CHANCE_AT_NM : chanceAtNm;
        try {
            fiber.attenuation().validRange().require(atNm, "the silica attenuation model");
        } catch (IllegalArgumentException e) {
            throw new UsageProblem("--chance-at-nm: " + e.getMessage());
        }
        LossBudget budget = LossBudget.of(onePass(fiber), WavelengthGrid.ofNm(atNm));
        ElementAllowances.Fiber spreads = spreads();
        PathAllowances allowances = new PathAllowances(budget.path().elements().stream()
                .map(e -> e instanceof FiberSegment ? (ElementAllowances) spreads : new ElementAllowances.Exact())
                .toList());
        Chance chance = PathUncertainty.standard().chanceWithin(budget, 0, allowances, chanceWithinDb);
        return new WithinChance(chanceWithinDb, atNm, budget.totalLossDbAt(0), chance, spreads);
    }

    /** The fiber's spreads: those given on the command line, else the shipped defaults. */
    private ElementAllowances.Fiber spreads() {
        BudgetInputUncertainties shipped = BudgetInputUncertainties.SHIPPED;
        return new ElementAllowances.Fiber(
                given(lengthSpread, "--length-spread", SpreadInput.LENGTH, shipped.fiberLength(), lengthM),
                given(attenuationSpread, "--attenuation-spread", SpreadInput.ATTENUATION, shipped.attenuation(), 1),
                shipped.ohContent(), shipped.bendRadius());
    }

    private static Allowance given(String text, String option, SpreadInput input, Allowance shipped, double nominal) {
        if (text == null) {
            return shipped;
        }
        try {
            StatedSpread spread = StatedSpread.parse(text, input);
            return SpreadResolver.stated(spread, shipped, nominal, BasisKind.STATED, option + " " + spread,
                    StatedSpreads.NONE.withBasis("given on the command line"));
        } catch (IllegalArgumentException e) {
            throw new UsageProblem(option + ": " + e.getMessage());
        }
    }

    private LightPath onePass(FiberSpec fiber) {
        FiberSegment segment = new FiberSegment("fiber", fiber, lengthM,
                bendRadiusMm == null ? OptionalDouble.empty() : OptionalDouble.of(bendRadiusMm),
                bendRadiusMm == null ? 0 : bendCount);
        return LightPath.of("one fiber", FaceElement.inAir("entry face", fiber), segment,
                FaceElement.inAir("exit face", fiber));
    }

    private double[] requestedWavelengthsNm() {
        if (axis.wavelengthsNm != null) {
            for (double w : axis.wavelengthsNm) {
                requireFinite(w, "--wavelengths-nm");
            }
            return axis.wavelengthsNm.clone();
        }
        double[] w = new double[axis.wavenumbersCm.length];
        for (int i = 0; i < w.length; i++) {
            double k = axis.wavenumbersCm[i];
            requireFinite(k, "--wavenumbers-cm");
            if (!(k > 0)) {
                throw new UsageProblem("--wavenumbers-cm must be positive, was " + k);
            }
            w[i] = Wavenumber.nmFromWavenumberCm(k);
        }
        return w;
    }

    private static void requireFinite(double v, String option) {
        if (!Double.isFinite(v)) {
            throw new UsageProblem(option + " must be a finite number, was " + v);
        }
    }

    private static void printJson(PrintWriter out, List<Point> points, WithinChance chance) {
        StringBuilder b = new StringBuilder("{\"points\":[");
        for (int i = 0; i < points.size(); i++) {
            Point p = points.get(i);
            if (i > 0) {
                b.append(',');
            }
            b.append('{')
                    .append("\"wavelength_nm\":").append(JsonText.number(p.wavelengthNm()))
                    .append(",\"attenuation_db_per_km\":").append(JsonText.number(p.attenuationDbPerKm()))
                    .append(",\"fiber_loss_db\":").append(JsonText.number(p.fiberLossDb()))
                    .append(",\"fresnel_loss_db_per_face\":").append(JsonText.number(p.faceLossDb()))
                    .append(",\"bend_loss_db\":").append(JsonText.number(p.bendLossDb()))
                    .append(",\"total_loss_db\":").append(JsonText.number(p.totalLossDb()))
                    .append(",\"transmittance\":").append(JsonText.number(p.transmittance()))
                    .append('}');
        }
        b.append(']');
        if (chance != null) {
            b.append(",\"chance\":{")
                    .append("\"within_db\":").append(JsonText.number(chance.allowedLossDb()))
                    .append(",\"at_nm\":").append(JsonText.number(chance.wavelengthNm()))
                    .append(",\"predicted_loss_db\":").append(JsonText.number(chance.predictedLossDb()))
                    .append(",\"probability\":").append(JsonText.number(chance.chance().probability()))
                    .append(",\"standard_error\":").append(JsonText.number(chance.chance().standardError()))
                    .append(",\"trials\":").append(chance.chance().trials())
                    .append('}');
        }
        out.println(b.append('}'));
    }

    private static void printChance(PrintWriter out, WithinChance c) {
        out.println();
        out.println(String.format(Locale.ROOT, "chance the loop stays within %s dB at %s nm: %.1f %%",
                plain(c.allowedLossDb()), plain(c.wavelengthNm()), 100 * c.chance().probability()));
        out.println(String.format(Locale.ROOT, "  predicted %.3f dB there; Monte Carlo, %d trials (JCGM 101:2008),"
                + " statistical scatter ±%.1f %%; faces taken as exact. Spreads:", c.predictedLossDb(),
                c.chance().trials(), 100 * c.chance().standardError()));
        ElementAllowances.Fiber spreads = c.spreads();
        for (Allowance a : List.of(spreads.length(), spreads.attenuation(), spreads.ohContent(),
                spreads.bendRadius())) {
            out.println("  - " + a.what() + ": " + a.basisText() + " (" + a.basis().name().toLowerCase(Locale.ROOT)
                    .replace('_', ' ') + ")");
        }
    }

    private void printTable(PrintWriter out, FiberSpec fiber, List<Point> points, BendRadiusCheck radiusCheck) {
        out.println(String.format(Locale.ROOT, "Fiber %s/%s µm, NA %s, fused-silica core, %s, length %s m%s",
                plain(coreUm), plain(claddingUm), plain(na), ((SilicaAttenuation) fiber.attenuation()).grade().label() + " grade " + plain(ohPpm) + " ppm OH",
                plain(lengthM),
                bendRadiusMm == null ? ", no bends entered"
                        : String.format(Locale.ROOT, ", %d bend%s at %s mm%s", bendCount, bendCount == 1 ? "" : "s",
                                plain(bendRadiusMm), bendCount > 1 ? " (charged once)" : "")));
        out.println("One pass: entry face + fiber + exit face + bends; faces in air; bends worst case (fully filled),"
                + " the tightest charged once.");
        out.println();
        TextTable table = new TextTable(
                new String[] {"wavelength", "wavenumber", "attenuation", "fiber", "Fresnel/face", "bends", "total",
                    "transmittance", "reach at " + plain(allowedLossDb) + " dB"},
                new String[] {"(nm)", "(cm-1)", "(dB/km)", "(dB)", "(dB)", "(dB)", "(dB)", "(%)", "(m)"});
        boolean anyClamped = false;
        for (Point p : points) {
            anyClamped |= p.bendClamped();
            table.row(
                    f("%.1f", p.wavelengthNm()),
                    f("%.1f", Wavenumber.wavenumberCmFromNm(p.wavelengthNm())),
                    f("%.2f", p.attenuationDbPerKm()),
                    f("%.3f", p.fiberLossDb()),
                    f("%.3f", p.faceLossDb()),
                    f("%.3f", p.bendLossDb()) + (p.bendClamped() ? "*" : ""),
                    f("%.3f", p.totalLossDb()),
                    f("%.2f", 100 * p.transmittance()),
                    f("%.1f", p.reachM()));
        }
        table.print(out);
        if (anyClamped) {
            out.println("* bend radius outside Gloge's formula: loss clamped to 30 dB per bend");
        }
        out.println();
        List<SpectralWindow> windows = usableWindows(fiber);
        String grid = String.format(Locale.ROOT, "1 nm grid over %.0f-%.0f nm", WINDOW_GRID_START_NM, WINDOW_GRID_END_NM);
        if (windows.isEmpty()) {
            out.println(String.format(Locale.ROOT, "Usable windows (total ≤ %s dB, %s): none", plain(allowedLossDb), grid));
        } else {
            out.println(String.format(Locale.ROOT, "Usable windows (total ≤ %s dB, %s): %s", plain(allowedLossDb), grid,
                    windows.stream().map(SpectralWindow::toString).collect(Collectors.joining(", "))));
        }
        if (radiusCheck != null && !radiusCheck.ok()) {
            out.println("Note: " + radiusCheck.message());
        }
    }

    private List<SpectralWindow> usableWindows(FiberSpec fiber) {
        WavelengthGrid grid = WavelengthGrid.uniformNm(WINDOW_GRID_START_NM, WINDOW_GRID_END_NM, WINDOW_GRID_POINTS);
        return Reach.usableWindows(LossBudget.of(onePass(fiber), grid), allowedLossDb);
    }

    private static String f(String format, double v) {
        return String.format(Locale.ROOT, format, v);
    }

    private static String plain(double v) {
        return JsonText.number(v);
    }
}
