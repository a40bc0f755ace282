package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A second spreadsheet program opens the dossier: LibreOffice, headless, converts it to PDF. Not in
 * the default build (it needs LibreOffice installed); run it with
 * {@code mvn -B -ntp verify -Plibreoffice-check -pl app -am}.
 */
class ExportLibreOfficeCheck {

    private static final long TIMEOUT_S = 300;

    @TempDir
    Path dir;

    @Test
    void libreOfficeConvertsTheDossierToPdf() throws IOException, InterruptedException {
        Path site = DemoWorkbook.create(dir.resolve("saltmarsh.sqlite"), ExportCommandTest.POINTS, 4);
        Path xlsx = dir.resolve("dossier.xlsx");
        CliRun export = CliRun.of("export", site.toString(), "-o", xlsx.toString());
        assertEquals(0, export.exitCode(), export.err());

        // a profile of its own, so that a LibreOffice already running for the user is not disturbed
        Path profile = dir.resolve("lo-profile");
        Process p = new ProcessBuilder("soffice", "-env:UserInstallation=" + profile.toUri(), "--headless",
                "--convert-to", "pdf", "--outdir", dir.toString(), xlsx.toString())
                .redirectErrorStream(true).redirectOutput(dir.resolve("soffice.log").toFile()).start();
        assertTrue(p.waitFor(TIMEOUT_S, TimeUnit.SECONDS), "LibreOffice did not finish within " + TIMEOUT_S + " s");
        String log = Files.readString(dir.resolve("soffice.log"), StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), log);

        Path pdf = dir.resolve("dossier.pdf");
        assertTrue(Files.isRegularFile(pdf), "no PDF: " + log);
        byte[] head = new byte[5];
        try (var in = Files.newInputStream(pdf)) {
            assertEquals(5, in.read(head));
        }
        assertEquals("%PDF-", new String(head, StandardCharsets.US_ASCII));
        assertTrue(Files.size(pdf) > 50_000, "a dossier of twelve sheets and four charts: " + Files.size(pdf) + " bytes");
        int pages = pages(pdf);
        assertTrue(pages < 0 || pages >= 12, "at least a page per sheet, was " + pages);
    }

    /** Pages by pdfinfo (poppler), or −1 when it is not installed. */
    private static int pages(Path pdf) throws InterruptedException {
        try {
            Process info = new ProcessBuilder("pdfinfo", pdf.toString()).redirectErrorStream(true).start();
            List<String> lines = new String(info.getInputStream().readAllBytes(), StandardCharsets.UTF_8).lines().toList();
            info.waitFor(60, TimeUnit.SECONDS);
            return lines.stream().filter(l -> l.startsWith("Pages:")).map(l -> Integer.parseInt(l.substring(6).trim()))
                    .findFirst().orElse(-1);
        } catch (IOException e) {
            return -1;
        }
    }
}
