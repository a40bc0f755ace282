package org.strandbook.schedule;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.ProbeType;

/**
 * Fiber, connector and probe types known by code: the shipped defaults, a site's own catalog, or
 * the types a contractor adds on a schedule's catalog sheets. Codes are unique within one catalog,
 * ignoring letter case.
 */
public record ComponentCatalog(List<FiberType> fiberTypes, List<ConnectorType> connectorTypes,
                               List<ProbeType> probeTypes) {

    private static final ComponentCatalog EMPTY = new ComponentCatalog(List.of(), List.of(), List.of());

    public ComponentCatalog {
        fiberTypes = List.copyOf(fiberTypes);
        connectorTypes = List.copyOf(connectorTypes);
        probeTypes = List.copyOf(probeTypes);
        requireUniqueCodes(fiberTypes.stream().map(FiberType::code).toList(), "fiber type");
        requireUniqueCodes(connectorTypes.stream().map(ConnectorType::code).toList(), "connector type");
        requireUniqueCodes(probeTypes.stream().map(ProbeType::code).toList(), "probe type");
    }

    public static ComponentCatalog empty() {
        return EMPTY;
    }

    /**
     * The generic types shipped with Strandbook (templates module: fiber-types.csv,
     * connector-types.csv, probe-types.csv). Their figures are typical values marked "from memory"
     * or "common practice" in the files; check them against the installed parts.
     */
    public static ComponentCatalog shipped() {
        return ShippedCatalog.INSTANCE;
    }

    /** This catalog and {@code other} together; throws when a code appears in both. */
    public ComponentCatalog plus(ComponentCatalog other) {
        List<FiberType> f = new ArrayList<>(fiberTypes);
        f.addAll(other.fiberTypes);
        List<ConnectorType> c = new ArrayList<>(connectorTypes);
        c.addAll(other.connectorTypes);
        List<ProbeType> p = new ArrayList<>(probeTypes);
        p.addAll(other.probeTypes);
        return new ComponentCatalog(f, c, p);
    }

    public boolean isEmpty() {
        return fiberTypes.isEmpty() && connectorTypes.isEmpty() && probeTypes.isEmpty();
    }

    /** The fiber type with exactly this code. */
    public Optional<FiberType> fiberType(String code) {
        return fiberTypes.stream().filter(t -> t.code().equals(code)).findFirst();
    }

    /** The connector type with exactly this code. */
    public Optional<ConnectorType> connectorType(String code) {
        return connectorTypes.stream().filter(t -> t.code().equals(code)).findFirst();
    }

    /** The probe type with exactly this code. */
    public Optional<ProbeType> probeType(String code) {
        return probeTypes.stream().filter(t -> t.code().equals(code)).findFirst();
    }

    private static void requireUniqueCodes(List<String> codes, String what) {
        Set<String> seen = new HashSet<>();
        for (String code : codes) {
            if (!seen.add(code.toLowerCase(Locale.ROOT))) {
                throw new IllegalArgumentException(what + " code '" + code + "' appears twice in one catalog");
            }
        }
    }

    private static final class ShippedCatalog {
        static final ComponentCatalog INSTANCE = CatalogCsv.readShipped();
    }
}
