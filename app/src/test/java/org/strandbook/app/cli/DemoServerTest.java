package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.samplesite.DemoSite;
import org.strandbook.server.LocalPostgres;

/** `strandbook demo --server URL`: the invented plant pushes itself to a real PostgreSQL plant server. */
class DemoServerTest {

    @TempDir
    Path dir;

    @Test
    void theDemoPushesItselfAndAppearsInTheFleet() {
        String url = LocalPostgres.shared().newPlantServer("demo_tech");
        CliRun demo = CliRun.of("demo", "--out", dir.resolve("demo").toString(), "--server", url,
                "--server-user", "demo_tech");
        assertEquals(0, demo.exitCode(), demo.err());
        assertTrue(demo.out().contains("the status of 12 point(s) reported"), demo.out());
        // twelve points, five of them with injected faults, two that a fixed tolerance gets wrong (README, Quick start)
        CliRun fleet = CliRun.of("fleet", "--server", url, "--server-user", "demo_tech", "--json");
        assertTrue(fleet.out().contains("\"site\":\"Saltmarsh Ridge Works\""), fleet.out());
        assertEquals(12, fleet.out().split("\"evaluated_at\"").length - 1, fleet.out());
        Path second = dir.resolve("second.strandbook");
        CliRun clone = CliRun.of("clone", "--server", url, "--server-user", "demo_tech", "--site",
                "Saltmarsh Ridge Works", second.toString());
        assertEquals(0, clone.exitCode(), clone.err());
        CliRun evaluated = CliRun.of("evaluate", second.toString(), "--json");
        CliRun original = CliRun.of("evaluate", dir.resolve("demo").resolve(DemoSite.WORKBOOK_NAME).toString(), "--json");
        assertEquals(strip(original.out()), strip(evaluated.out()), "the clone judges every point as the original does");
    }

    /** The evaluation's own time stamp differs between two runs; everything else must not. */
    private static String strip(String json) {
        return json.replaceAll("\"evaluated_at\":\"[^\"]*\"", "");
    }
}
