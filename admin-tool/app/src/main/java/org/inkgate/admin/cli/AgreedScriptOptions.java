package org.inkgate.admin.cli;

import java.util.List;
import java.util.Map;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/**
 * The options that name a response and its agreed scores, shared by {@code rate control mark} and
 * {@code rate qualification mark} so that both read and check them the same way.
 */
final class AgreedScriptOptions {

    @Option(names = "--candidate", required = true, paramLabel = "NUMBER", description = "whose response")
    String candidate;

    @Option(names = "--task", required = true, paramLabel = "ID", description = "which task")
    String task;

    @Option(names = "--agreed", required = true, paramLabel = "CRITERION=SCORE", split = ",",
            description = "the agreed score of every criterion, e.g. --agreed content=5,language=6")
    List<String> agreed;

    @Option(names = "--source", required = true, paramLabel = "TEXT", description = "where the agreed scores come from")
    String source;

    /** The agreed scores by criterion, refused with the option's name when one is not CRITERION=SCORE. */
    Map<String, Integer> scores(CommandSpec spec) {
        return RateCommand.scores(spec, agreed);
    }
}
