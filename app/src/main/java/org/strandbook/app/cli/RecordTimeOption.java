package org.strandbook.app.cli;

import java.time.Instant;

import picocli.CommandLine.Option;

/** The {@code --at TIME} of the commands that record field work; mix it in with {@code @Mixin}. */
public final class RecordTimeOption {

    @Option(names = "--at", paramLabel = "TIME", description = "When: 2026-05-03, 2026-05-03T10:15 (UTC) or an "
            + "ISO-8601 instant (default: now). A time in the future is refused.")
    String at;

    /** The time given, or now; a time in none of the accepted forms is wrong usage. */
    Instant instant() {
        return FieldTime.parse("--at", at);
    }
}
