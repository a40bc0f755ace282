package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;

import picocli.CommandLine;

class HelpTextTest {

    @Test
    void everyCommandDescriptionIsAValidFormatString() {
        // picocli formats each description line with String.format (picocli user manual, "Usage Help"):
        // a bare '%' prints a warning instead of the help, so it must be written '%%'
        CommandLine root = StrandbookCommand.newCommandLine(new PrintWriter(new StringWriter()),
                new PrintWriter(new StringWriter()));
        for (CommandLine c : allCommands(root)) {
            for (String line : c.getCommandSpec().usageMessage().description()) {
                assertDoesNotThrow(() -> String.format(Locale.ROOT, line), c.getCommandName() + ": " + line);
            }
        }
    }

    private static List<CommandLine> allCommands(CommandLine c) {
        List<CommandLine> out = new ArrayList<>(List.of(c));
        for (CommandLine sub : c.getSubcommands().values()) {
            out.addAll(allCommands(sub));
        }
        return out;
    }
}
