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

    @Mixin
    RecordTimeOption at;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (element != null && point == null) {
            throw new UsageProblem("--element needs --point: a joint or cable belongs to a point");
        }
        Note note = new Note(point, element, at.instant(), by, String.join(" ", text));
        try (Workbook wb = workbook.open()) {
            wb.notes().add(note);
        }
        spec.commandLine().getOut().println("recorded: note on " + note.subject() + " by " + note.author());
        spec.commandLine().getOut().flush();
        return StrandbookCommand.EXIT_OK;
    }
}
