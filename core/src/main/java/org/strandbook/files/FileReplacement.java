package org.strandbook.files;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Puts a finished file in place of the target: every file Strandbook writes (workbook copies,
 * dossiers, cable schedules, spectrum files) is written whole under another name beside the
 * target first, then moved over it here.
 */
public final class FileReplacement {

    private FileReplacement() {
    }

    /**
     * Moves {@code finished} over {@code target}, replacing a file there: in one step where the file
     * system can, so that a reader sees the old file or the new one and never a mix; otherwise (some
     * removable media) a plain replacing move.
     */
    public static void moveOver(Path finished, Path target) throws IOException {
        try {
            Files.move(finished, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(finished, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
