package org.strandbook.scanfile;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

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
            try {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }
}
