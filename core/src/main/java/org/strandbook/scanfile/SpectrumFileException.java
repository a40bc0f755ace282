package org.strandbook.scanfile;

/**
 * A spectrum file that Strandbook will not import, with the place and the reason.
 *
 * <p>Checked on purpose: every caller that reads an analyzer's file must decide what to tell the
 * technician when the file is bad, and the compiler makes sure it does. {@link #getMessage()} is
 * always one line of the form {@code file:line: what is wrong}, e.g.
 * {@code ref_2026.jdx:57: DIF Y-value check failed: line ends with 1203, next line starts with 1210}.
 * The line number is 1-based; 0 means the problem is not tied to one line (an empty file, a file
 * too large, a count that disagrees with the whole table).
 */
public final class SpectrumFileException extends Exception {

    private static final int MAX_PROBLEM_LENGTH = 300;

    private final String fileName;
    private final int lineNumber;
    private final String problem;

    /**
     * @param fileName   the file's name as the user knows it (a blank name is shown as {@code (unnamed)})
     * @param lineNumber 1-based line of the problem, or 0 if it concerns no single line
     * @param problem    what is wrong, in the words a technician understands
     */
    public SpectrumFileException(String fileName, int lineNumber, String problem) {
        this(fileName, lineNumber, problem, null);
    }

    /** As {@link #SpectrumFileException(String, int, String)}, keeping the low-level cause. */
    public SpectrumFileException(String fileName, int lineNumber, String problem, Throwable cause) {
        super(compose(displayName(fileName), Math.max(0, lineNumber), oneLine(problem)), cause);
        this.fileName = displayName(fileName);
        this.lineNumber = Math.max(0, lineNumber);
        this.problem = oneLine(problem);
    }

    /** The file's name as shown in the message. */
    public String fileName() {
        return fileName;
    }

    /** The 1-based line of the problem, or 0 when no single line is at fault. */
    public int lineNumber() {
        return lineNumber;
    }

    /** What is wrong, without the file and line prefix. */
    public String problem() {
        return problem;
    }

    private static String compose(String fileName, int lineNumber, String problem) {
        return fileName + ":" + lineNumber + ": " + problem;
    }

    private static String displayName(String fileName) {
        return fileName == null || fileName.isBlank() ? "(unnamed)" : PrintableName.of(fileName);
    }

    // The message must stay one line: it goes to a terminal or a log line, and it may quote file text.
    private static String oneLine(String text) {
        if (text == null || text.isBlank()) {
            return "unreadable spectrum file";
        }
        StringBuilder sb = new StringBuilder(Math.min(text.length(), MAX_PROBLEM_LENGTH + 1));
        for (int i = 0; i < text.length() && sb.length() < MAX_PROBLEM_LENGTH; i++) {
            char c = text.charAt(i);
            sb.append(Character.isISOControl(c) ? ' ' : c);
        }
        if (text.length() > MAX_PROBLEM_LENGTH) {
            sb.append('…');
        }
        String line = sb.toString().strip();
        return line.isEmpty() ? "unreadable spectrum file" : line;
    }
}
