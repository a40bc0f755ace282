package org.strandbook.scanfile;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Picks the block to import from a multi-block JCAMP-DX file (a LINK block holding several, or
 * blocks one after another): the one block that is an optical spectrum Strandbook reads, or the
 * block the user named. Several candidates and no choice is refused with the list, never guessed.
 */
final class MultiBlockChoice {

    private final String fileName;
    private final String sha256Hex;
    private final String[] lines;
    private final List<JcampBlocks.Block> blocks;

    MultiBlockChoice(String fileName, String sha256Hex, String[] lines, List<JcampBlocks.Block> blocks) {
        this.fileName = fileName;
        this.sha256Hex = sha256Hex;
        this.lines = lines;
        this.blocks = List.copyOf(blocks);
    }

    /** @param block 1-based block number, or {@link SpectrumFiles#WHOLE_FILE} for the file's one optical spectrum */
    SpectrumFile read(int block) throws SpectrumFileException {
        if (block > 0) {
            if (block > blocks.size()) {
                throw new SpectrumFileException(fileName, 0, "block " + block + " was asked for, but the file holds "
                        + blocks.size() + " data blocks: " + describe(blocks));
            }
            return readBlock(blocks.get(block - 1), "chosen with --block " + block);
        }
        List<JcampBlocks.Block> candidates = new ArrayList<>();
        List<String> refusals = new ArrayList<>();
        for (JcampBlocks.Block b : blocks) {
            try {
                header(b);
                candidates.add(b);
            } catch (SpectrumFileException e) {
                refusals.add("block " + b.number() + " (line " + e.lineNumber() + "): " + e.problem());
            }
        }
        if (candidates.size() == 1) {
            return readBlock(candidates.get(0), "the file's one optical spectrum among " + blocks.size() + " blocks");
        }
        if (candidates.isEmpty()) {
            throw new SpectrumFileException(fileName, blocks.get(0).titleLine(), "none of the " + blocks.size()
                    + " data blocks is an optical spectrum Strandbook reads; " + String.join("; ", refusals));
        }
        throw new SpectrumFileException(fileName, candidates.get(0).titleLine(), "the file holds "
                + candidates.size() + " optical spectra (" + describe(candidates) + "): choose one with --block N");
    }

    private JcampDxReader.Header header(JcampBlocks.Block b) throws SpectrumFileException {
        return new JcampDxReader(fileName, sha256Hex).header(lines, b.titleLine() - 1, b.endLine());
    }

    private SpectrumFile readBlock(JcampBlocks.Block b, String why) throws SpectrumFileException {
        SpectrumFile read = new JcampDxReader(fileName, sha256Hex).readBlock(lines, b.titleLine() - 1, b.endLine());
        return read.withTolerated(List.of("multi-block file: block " + b.number() + " of " + blocks.size() + " ("
                + quoteTitle(b) + ", lines " + b.titleLine() + "–" + b.endLine() + ") read, " + why));
    }

    private static String describe(List<JcampBlocks.Block> list) {
        return list.stream().map(b -> "block " + b.number() + " " + quoteTitle(b) + " on line " + b.titleLine())
                .collect(Collectors.joining(", "));
    }

    private static String quoteTitle(JcampBlocks.Block b) {
        String t = b.title().length() > 40 ? b.title().substring(0, 40) + "…" : b.title();
        return "'" + t + "'";
    }
}
