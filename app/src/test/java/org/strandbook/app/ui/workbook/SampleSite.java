package org.strandbook.app.ui.workbook;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.extension.ExtensionContext;
import org.junit.jupiter.api.extension.ParameterContext;
import org.junit.jupiter.api.extension.ParameterResolver;
import org.strandbook.samplesite.DemoSite;
import org.strandbook.samplesite.ScanGenerator;

/**
 * The invented sample plant, built once per test run (it takes a few seconds) in a temporary
 * folder that is removed when the run ends (JUnit closes what its root store holds). Tests that change a workbook work on their own copy.
 * Use it as a parameter of a {@code @BeforeAll} method with {@code @ExtendWith(SampleSite.Resolver.class)}.
 */
public final class SampleSite implements AutoCloseable {

    /** Hands the shared sample site to test methods. */
    public static final class Resolver implements ParameterResolver {

        @Override
        public boolean supportsParameter(ParameterContext parameter, ExtensionContext context) {
            return parameter.getParameter().getType() == SampleSite.class;
        }

        @Override
        public Object resolveParameter(ParameterContext parameter, ExtensionContext context) {
            return context.getRoot().getStore(ExtensionContext.Namespace.create(SampleSite.class))
                    .getOrComputeIfAbsent(SampleSite.class, k -> build(), SampleSite.class);
        }
    }

    private final Path root;
    private final DemoSite.Built built;

    private SampleSite(Path root, DemoSite.Built built) {
        this.root = root;
        this.built = built;
    }

    private static SampleSite build() {
        try {
            Path root = Files.createTempDirectory("strandbook-sample-test");
            return new SampleSite(root, DemoSite.build(root.resolve("site"), ScanGenerator.DEMO_SEED, step -> { }));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The folder the sample was built in (it holds the workbook under its usual name). */
    public Path folder() {
        return built.workbook().getParent();
    }

    public Path schedule() {
        return built.schedule();
    }

    /** A copy of the sample workbook in {@code dir}, to change freely. */
    public Path workbookCopy(Path dir) {
        try {
            return Files.copy(built.workbook(), dir.resolve(DemoSite.WORKBOOK_NAME));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * A loop scan file of {@code pointTag} not yet in the workbook: one of the point's own
     * delimited-text loop scans with a later time in its header, so its bytes (and SHA-256) differ.
     */
    public Path newLoopScan(String pointTag, Path dir, int day) {
        try (Stream<Path> files = Files.list(built.scanFolder().resolve(pointTag))) {
            Path loop = files.filter(f -> f.getFileName().toString().endsWith("_loop.csv")).sorted().findFirst()
                    .orElseThrow(() -> new IllegalStateException("no delimited loop scan of " + pointTag));
            List<String> lines = Files.readAllLines(loop, StandardCharsets.UTF_8);
            lines.replaceAll(l -> l.startsWith("# taken_at:") ? String.format("# taken_at: 2026-11-%02dT09:00:00Z", day) : l);
            Path out = dir.resolve(pointTag + "_2026-11-" + day + "_loop.csv");
            Files.write(out, lines, StandardCharsets.UTF_8);
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void close() throws IOException {
        try (Stream<Path> all = Files.walk(root)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
