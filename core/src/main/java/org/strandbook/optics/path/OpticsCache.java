package org.strandbook.optics.path;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

import org.strandbook.optics.Fresnel;
import org.strandbook.optics.OpticalMaterial;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.AttenuationModel;
import org.strandbook.optics.bend.BendLossSpectrum;
import org.strandbook.optics.bend.BendRadiusCheck;
import org.strandbook.optics.bend.GlogeBend;
import org.strandbook.optics.bend.MinimumBendRadius;
import org.strandbook.optics.joint.ConnectorAllowance;
import org.strandbook.optics.joint.JointEfficiency;
import org.strandbook.optics.joint.JointGeometry;

/**
 * The grid-dependent spectral terms of light-path elements on one {@link WavelengthGrid}, computed
 * once and reused: attenuation per fiber model, bend loss per (fiber, radius), the whole loss of
 * each distinct joint, face and probe. Evaluating many budgets on one grid then costs little more
 * than adding spectra.
 *
 * <p>Keys are element values without their labels, so equal catalog items share one entry. Safe for
 * concurrent use; entries are never evicted (a site has tens of fiber and connector types, not
 * millions). Cached arrays never leave this package uncopied.
 */
public final class OpticsCache {

    private final WavelengthGrid grid;
    private final double middleNm;
    private final Map<AttenuationModel, double[]> attenuation = new ConcurrentHashMap<>();
    private final Map<BendKey, BendTerms> bends = new ConcurrentHashMap<>();
    private final Map<Object, double[]> fixedLosses = new ConcurrentHashMap<>();

    public OpticsCache(WavelengthGrid grid) {
        this.grid = Objects.requireNonNull(grid, "grid");
        this.middleNm = grid.wavelengthNm(grid.size() / 2);
    }

    public WavelengthGrid grid() {
        return grid;
    }

    /** Number of cached spectra (for diagnostics and tests). */
    public int entries() {
        return attenuation.size() + bends.size() + fixedLosses.size();
    }

    /** Attenuation (dB/km) of a fiber model on this grid, a copy. */
    public double[] attenuationDbPerKm(AttenuationModel model) {
        return attenuationShared(model).clone();
    }

    /**
     * The loss spectrum (dB) of one element on this grid, a fresh copy. A fiber segment's loss is
     * attenuation × length + the charged bends × loss per bend.
     */
    public double[] lossDb(PathElement element) {
        if (element instanceof FiberSegment f) {
            double[] att = attenuationShared(f.fiber().attenuation());
            BendTerms bend = bendTerms(f);
            boolean bends = bend != null && f.chargedBends() > 0;
            return new Contribution(f.label(), f.kind(), att, f.lengthM() * 1e-3,
                    bends ? bend.lossDbPerBend() : null, bends ? f.chargedBends() : 0).lossDb();
        }
        return fixedLossShared(element).clone();
    }

    double[] attenuationShared(AttenuationModel model) {
        double[] a = attenuation.get(model);
        if (a == null) {
            a = model.attenuationDbPerKm(grid);
            attenuation.putIfAbsent(model, a);
        }
        return a;
    }

    /** Bend terms of a segment, or null when it has no bend radius. */
    BendTerms bendTerms(FiberSegment segment) {
        if (segment.bendRadiusMm().isEmpty()) {
            return null;
        }
        FiberSpec fiber = segment.fiber();
        BendKey key = new BendKey(fiber.coreUm(), fiber.claddingUm(), fiber.na(), fiber.coreMaterial(),
                segment.bendRadiusMm().getAsDouble());
        BendTerms t = bends.get(key);
        if (t == null) {
            BendLossSpectrum s = GlogeBend.lossPerBend(key.coreUm, key.na, key.coreMaterial, key.radiusMm, grid);
            BendRadiusCheck check = MinimumBendRadius.check(key.claddingUm, key.radiusMm);
            String clampNote = s.anyClamped() ? String.format(Locale.ROOT,
                    "bend radius %.1f mm is outside Gloge's formula at %d wavelengths; loss clamped to %.0f dB per bend there",
                    key.radiusMm, s.clampedPoints(), -10 * Math.log10(GlogeBend.MIN_GUIDED_FRACTION)) : "";
            t = new BendTerms(s.lossDb(), s.clampedPoints(), check, check.message(), clampNote);
            bends.putIfAbsent(key, t);
        }
        return t;
    }

    /** Loss of a joint, face or probe: the same for every use of an equal element. */
    double[] fixedLossShared(PathElement element) {
        Object key = keyOf(element);
        double[] loss = fixedLosses.get(key);
        if (loss == null) {
            try {
                loss = computeFixedLoss(element);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException(element.kind().name().toLowerCase(Locale.ROOT)
                        + " '" + element.label() + "': " + e.getMessage(), e);
            }
            fixedLosses.putIfAbsent(key, loss);
        }
        return loss;
    }

    private static Object keyOf(PathElement element) {
        if (element instanceof JointElement j) {
            return new JointKey(j.from(), j.to(), j.mechanics());
        }
        if (element instanceof FaceElement f) {
            return new FaceKey(f.glass(), f.outside());
        }
        if (element instanceof ProbeElement p) {
            return new ProbeKey(p.windows(), p.fixedLossDb(), p.medium());
        }
        throw new IllegalArgumentException("a fiber segment's loss depends on its length and is not cached whole");
    }

    private double[] computeFixedLoss(PathElement element) {
        if (element instanceof JointElement j) {
            return jointLoss(j);
        }
        if (element instanceof FaceElement f) {
            return Fresnel.faceLossDb(f.glass(), f.outside(), grid);
        }
        return probeLoss((ProbeElement) element);
    }

    private double[] jointLoss(JointElement j) {
        FiberSpec from = j.from();
        FiberSpec to = j.to();
        double efficiency = JointEfficiency.coreMismatch(from.coreUm(), to.coreUm())
                * JointEfficiency.naMismatch(from.na(), to.na());
        double[] loss = new double[grid.size()];
        if (j.mechanics() instanceof ConnectorAllowance allowance) {
            Arrays.fill(loss, JointEfficiency.lossDb(efficiency) + allowance.lossDb());
            return loss;
        }
        JointGeometry g = (JointGeometry) j.mechanics();
        // the geometric terms hardly depend on wavelength: take the gap index at the grid's middle
        double gapIndex = g.physicalContact() ? from.coreMaterial().refractiveIndex(middleNm)
                : g.gapMedium().refractiveIndex(middleNm);
        efficiency *= JointEfficiency.lateralOffset(g.lateralOffsetUm(), from.coreUm())
                * JointEfficiency.endGap(g.gapUm(), from.coreUm(), from.na(), gapIndex)
                * JointEfficiency.tilt(g.tiltDeg(), from.na(), gapIndex);
        double geometricDb = JointEfficiency.lossDb(efficiency);
        if (g.physicalContact()) {
            Arrays.fill(loss, geometricDb);
            return loss;
        }
        double[] fresnel = Fresnel.gapLossDb(from.coreMaterial(), g.gapMedium(), to.coreMaterial(), grid);
        for (int i = 0; i < loss.length; i++) {
            loss[i] = geometricDb + fresnel[i];
        }
        return loss;
    }

    private double[] probeLoss(ProbeElement p) {
        double[] loss = new double[grid.size()];
        Arrays.fill(loss, p.fixedLossDb());
        for (ProbeWindow w : p.windows()) {
            double[] faces = Fresnel.facesLossDb(w.material(), w.surrounding(), w.faceCount(), grid);
            for (int i = 0; i < loss.length; i++) {
                loss[i] += faces[i];
            }
        }
        if (p.medium().isPresent()) {
            MediumPath m = p.medium().get();
            m.medium().validRange().require(grid, "reference medium " + m.medium().name());
            for (int i = 0; i < loss.length; i++) {
                loss[i] += m.lossDb(grid.wavelengthNm(i));
            }
        }
        return loss;
    }

    /**
     * Loss of one bend (dB per grid point, shared), clamped points, the radius check and the notes
     * for a technician (composed once: budgets are evaluated by the thousand).
     */
    record BendTerms(double[] lossDbPerBend, int clampedPoints, BendRadiusCheck radiusCheck, String radiusNote,
            String clampNote) {
    }

    private record BendKey(double coreUm, double claddingUm, double na, OpticalMaterial coreMaterial, double radiusMm) {
    }

    private record JointKey(FiberSpec from, FiberSpec to, Object mechanics) {
    }

    private record FaceKey(OpticalMaterial glass, OpticalMaterial outside) {
    }

    private record ProbeKey(List<ProbeWindow> windows, double fixedLossDb, Optional<MediumPath> medium) {
    }
}
