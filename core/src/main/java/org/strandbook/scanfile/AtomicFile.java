package org.strandbook.scanfile;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.strandbook.files.FileReplacement;

/**
 * Replaces a file's content all at once: the bytes go to a temporary file beside the target, which
 * is then moved over it. A crash or a full disk leaves the old file (or none), never half a spectrum.
 */
final class AtomicFile {

    private AtomicFile() {
    }

    static void write(Path target, byte[] content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path directory = absolute.getParent();
        Path temporary = Files.createTempFile(directory, "." + absolute.getFileName(), ".part");
        try {
            Files.write(temporary, content);
            FileReplacement.moveOver(temporary, absolute);
        } finally {
            Files.deleteIfExists(temporary);
        }
    }
}
