package org.strandbook.scanfile;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/**
 * The block layout of a JCAMP-DX file: each block runs from its {@code ##TITLE=} to its
 * {@code ##END=}; a LINK block (McDonald &amp; Wilks, Appl. Spectrosc. 42, 151 (1988); Lampen et al.,
 * Appl. Spectrosc. 48, 1545 (1994)) holds further blocks before its own {@code ##END=}. The
 * blocks that hold data are the innermost ones, numbered 1, 2, ... in file order: the numbers
 * {@code import-scans --block N} takes.
 */
final class JcampBlocks {

    /** One innermost block: 1-based lines of its {@code ##TITLE=} and its {@code ##END=}. */
    record Block(int number, int titleLine, int endLine, String title) {
    }

    private JcampBlocks() {
    }

    /**
     * The innermost blocks when the file holds more than one block (nested or one after another);
     * empty for a file of one block, or one whose blocks do not balance, which the single-block
     * reading then refuses with its own message.
     */
    static List<Block> innermost(String[] lines) {
        record Open(int line, String title, boolean[] hasChild) {
        }
        Deque<Open> open = new ArrayDeque<>();
        List<Block> leaves = new ArrayList<>();
        int blocks = 0;
        for (int i = 0; i < lines.length; i++) {
            // data lines, the bulk of a file, are passed over without building any string
            if (!startsWithRecordMark(lines[i])) {
                continue;
            }
            String content = JcampDxReader.stripComment(lines[i]).strip();
            if (!content.startsWith("##")) {
                continue;
            }
            int eq = content.indexOf('=');
            if (eq < 0) {
                continue;
            }
            String key = JcampDxReader.normalizeLabel(content.substring(2, eq));
            if (key.equals("TITLE")) {
                if (!open.isEmpty()) {
                    open.peek().hasChild()[0] = true;
                }
                open.push(new Open(i + 1, content.substring(eq + 1).strip(), new boolean[1]));
            } else if (key.equals("END")) {
                if (open.isEmpty()) {
                    return List.of();
                }
                Open o = open.pop();
                blocks++;
                if (!o.hasChild()[0]) {
                    leaves.add(new Block(leaves.size() + 1, o.line(), i + 1, o.title()));
                }
            }
        }
        if (!open.isEmpty() || blocks <= 1) {
            return List.of();
        }
        return leaves;
    }

    private static boolean startsWithRecordMark(String line) {
        int i = 0;
        while (i < line.length() && Character.isWhitespace(line.charAt(i))) {
            i++;
        }
        return line.startsWith("##", i);
    }
}
