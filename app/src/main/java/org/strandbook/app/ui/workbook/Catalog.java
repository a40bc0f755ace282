package org.strandbook.app.ui.workbook;

import java.util.List;
import java.util.Optional;

import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.ProbeType;

/** The component catalogs of a workbook. */
public record Catalog(List<FiberType> fibers, List<ConnectorType> connectors, List<ProbeType> probes) {

    public static final Catalog EMPTY = new Catalog(List.of(), List.of(), List.of());

    public Catalog {
        fibers = List.copyOf(fibers);
        connectors = List.copyOf(connectors);
        probes = List.copyOf(probes);
    }

    public Optional<FiberType> fiber(String code) {
        return fibers.stream().filter(f -> f.code().equalsIgnoreCase(code)).findFirst();
    }

    public Optional<ConnectorType> connector(String code) {
        return connectors.stream().filter(c -> c.code().equalsIgnoreCase(code)).findFirst();
    }

    public Optional<ProbeType> probe(String code) {
        return probes.stream().filter(p -> p.code().equalsIgnoreCase(code)).findFirst();
    }

    public List<String> fiberCodes() {
        return fibers.stream().map(FiberType::code).toList();
    }

    public List<String> connectorCodes() {
        return connectors.stream().map(ConnectorType::code).toList();
    }

    public List<String> probeCodes() {
        return probes.stream().map(ProbeType::code).toList();
    }

    public Catalog withFibers(List<FiberType> newFibers) {
        return new Catalog(newFibers, connectors, probes);
    }
}
