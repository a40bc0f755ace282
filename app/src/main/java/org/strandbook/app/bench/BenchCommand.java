package org.strandbook.app.bench;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook bench ...}: speed benchmarks. Each measures its floor (the bare arithmetic doing
 * the same work) in the same run and prints {@code ratio: R} (our speed over the floor's) last.
 */
@Command(name = "bench",
        mixinStandardHelpOptions = true,
        description = "Measure Strandbook's speed against the bare arithmetic floor; last line 'ratio: R'.",
        subcommands = {
            OpticsBenchCommand.class,
            ImportBenchCommand.class,
            EvaluateBenchCommand.class,
            ListingBenchCommand.class,
            EditBenchCommand.class,
            ExportBenchCommand.class,
            SyncBenchCommand.class,
        })
public final class BenchCommand implements Runnable {

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "choose a benchmark: "
                + String.join(", ", spec.subcommands().keySet()));
    }
}
