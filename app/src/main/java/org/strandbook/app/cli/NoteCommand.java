package org.strandbook.app.cli;

import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.site.Note;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code strandbook note SITE [--point TAG [--element LABEL]] --by NAME TEXT...}: records a free note. */
@Command(name = "note", mixinStandardHelpOptions = true,
        description = "Record a note on the site, a point (--point) or one joint or cable of it (--element); "
            + "notes show in the point's history and in the dossier.")
final class NoteCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "TEXT", description = "The note.")
    List<String> text;

    @Option(names = "--point", paramLabel = "TAG", description = "The point the note is about.")
    String point;

    @Option(names = "--element", paramLabel = "LABEL", description = "The joint or cable ID of that point.")
    String element;

    @Option(names = "--by", required = true, paramLabel = "NAME", description = "Who writes it.")
    String by;

    @Option(names = "--at", paramLabel = "TIME", description = "When: 2026-05-03, 2026-05-03T10:15 (UTC) or an "
            + "ISO-8601 instant (default: now). A time in the future is refused.")
    String at;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (element != null && point == null) {
            throw new UsageProblem("--element needs --point: a joint or cable belongs to a point");
        }
        Note note = new Note(point, element, FieldTime.parse("--at", at), by, String.join(" ", text));
        try (Workbook wb = workbook.open()) {
            wb.notes().add(note);
        }
        spec.commandLine().getOut().println("recorded: note on " + note.subject() + " by " + note.author());
        spec.commandLine().getOut().flush();
        return StrandbookCommand.EXIT_OK;
    }
}
