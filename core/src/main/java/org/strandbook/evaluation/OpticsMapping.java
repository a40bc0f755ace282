package org.strandbook.evaluation;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.strandbook.optics.OpticalMaterial;
import org.strandbook.optics.SellmeierMaterial;
import org.strandbook.optics.attenuation.AttenuationModel;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.attenuation.SilicaFiberGrade;
import org.strandbook.optics.attenuation.TableWithModelAttenuation;
import org.strandbook.optics.attenuation.TabulatedAttenuation;
import org.strandbook.optics.joint.ConnectorAllowance;
import org.strandbook.optics.path.FiberSpec;
import org.strandbook.optics.path.ProbeElement;
import org.strandbook.optics.path.ProbeWindow;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.Joint;
import org.strandbook.site.OhGrade;
import org.strandbook.site.ProbeType;

/** Turns catalog records into the optics engine's element types. */
final class OpticsMapping {

    private OpticsMapping() {
    }

    static FiberSpec fiberSpec(FiberType type) {
        OpticalMaterial core = material(type.coreMaterial(), "fiber " + type.code() + " core");
        SilicaFiberGrade grade = type.ohGrade() == OhGrade.HIGH_OH ? SilicaFiberGrade.HIGH_OH : SilicaFiberGrade.LOW_OH;
        AttenuationModel model = SilicaAttenuation.of(grade, type.ohPpm());
        if (type.datasheet().size() >= 2) {
            List<AttenuationPoint> pts = type.datasheet();
            double[] w = pts.stream().mapToDouble(AttenuationPoint::wavelengthNm).toArray();
            double[] a = pts.stream().mapToDouble(AttenuationPoint::attenuationDbPerKm).toArray();
            model = new TableWithModelAttenuation(new TabulatedAttenuation(type.code() + " datasheet", w, a), model);
        }
        return new FiberSpec(type.coreUm(), type.claddingUm(), type.na(), core, model);
    }

    static OpticalMaterial material(String name, String where) {
        return switch (name.toUpperCase(Locale.ROOT).replace(' ', '_')) {
            case "FUSED_SILICA", "SILICA" -> SellmeierMaterial.FUSED_SILICA;
            case "SAPPHIRE" -> SellmeierMaterial.SAPPHIRE_ORDINARY;
            default -> throw new IllegalArgumentException(where + ": no dispersion data for material '" + name
                    + "' (known: FUSED_SILICA, SAPPHIRE)");
        };
    }

    /**
     * A joint's loss: the entered one if any, else the larger typical loss of its two connector types.
     * The typical loss of an SMA-class pair already holds its air-gap reflections.
     */
    static ConnectorAllowance allowance(Joint joint, Catalog catalog) {
        OptionalDouble entered = joint.lossDb();
        if (entered.isPresent()) {
            return new ConnectorAllowance(entered.getAsDouble(), joint.lossBasis().name().toLowerCase(Locale.ROOT)
                    + " on site");
        }
        ConnectorType a = catalog.connector(joint.connectorTypeA());
        ConnectorType b = catalog.connector(joint.connectorTypeB());
        double loss = Math.max(a.typicalLossDb(), b.typicalLossDb());
        return new ConnectorAllowance(loss, "typical loss of connector type " + (loss == a.typicalLossDb()
                ? a.code() : b.code()));
    }

    /**
     * The probe as the prediction sees it at commissioning: windows in air (a dry probe), its
     * fixed optics loss, and no process absorbance.
     */
    static ProbeElement probe(ProbeType type) {
        List<ProbeWindow> windows = type.windowFaces() == 0 ? List.of()
                : List.of(ProbeWindow.inAir(material(type.windowMaterial(), "probe " + type.code() + " window"),
                type.windowFaces()));
        return new ProbeElement("probe " + type.code(), windows, type.fixedLossDb(), Optional.empty());
    }
}
