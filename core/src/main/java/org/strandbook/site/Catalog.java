package org.strandbook.site;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The workbook's component catalogs, looked up by code. */
public record Catalog(Map<String, FiberType> fiberTypes, Map<String, ConnectorType> connectorTypes,
                      Map<String, ProbeType> probeTypes) {

    public Catalog {
        fiberTypes = Map.copyOf(fiberTypes);
        connectorTypes = Map.copyOf(connectorTypes);
        probeTypes = Map.copyOf(probeTypes);
    }

    public static Catalog of(List<FiberType> fibers, List<ConnectorType> connectors, List<ProbeType> probes) {
        Map<String, FiberType> f = new LinkedHashMap<>();
        fibers.forEach(t -> f.put(t.code(), t));
        Map<String, ConnectorType> c = new LinkedHashMap<>();
        connectors.forEach(t -> c.put(t.code(), t));
        Map<String, ProbeType> p = new LinkedHashMap<>();
        probes.forEach(t -> p.put(t.code(), t));
        return new Catalog(f, c, p);
    }

    public Optional<FiberType> findFiber(String code) {
        return Optional.ofNullable(fiberTypes.get(code));
    }

    public FiberType fiber(String code) {
        return findFiber(code).orElseThrow(() -> new IllegalArgumentException("unknown fiber type '" + code + "'"));
    }

    public ConnectorType connector(String code) {
        ConnectorType c = connectorTypes.get(code);
        if (c == null) {
            throw new IllegalArgumentException("unknown connector type '" + code + "'");
        }
        return c;
    }

    public ProbeType probe(String code) {
        ProbeType p = probeTypes.get(code);
        if (p == null) {
            throw new IllegalArgumentException("unknown probe type '" + code + "'");
        }
        return p;
    }
}
