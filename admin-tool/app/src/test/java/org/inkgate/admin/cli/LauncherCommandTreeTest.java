package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/**
 * The launcher builds only the subcommand that runs (issue 16: start-up), and that smaller tree
 * answers exactly as the whole tree does: same usage text, same errors, same exit codes.
 */
class LauncherCommandTreeTest {

    @Test
    void aNamedCommand_buildsOnlyThatCommand() {
        assertEquals(Set.of("analyse"), InkgateAdmin.commandLineFor("analyse", "--ratings", "r.csv").getSubcommands().keySet());
    }

    @Test
    void rootOptionsHelpAndUnknownNames_getTheWholeTree() {
        int all = InkgateAdmin.commandLine().getSubcommands().size();
        for (String[] args : List.of(new String[0], new String[] {"--help"}, new String[] {"--version"},
                new String[] {"help", "analyse"}, new String[] {"analyze"})) {
            assertEquals(all, InkgateAdmin.commandLineFor(args).getSubcommands().size(), String.join(" ", args));
        }
    }

    @Test
    void everyCommand_answersHelpAndWrongUsageAsTheWholeTreeDoes() {
        for (String name : InkgateAdmin.commandLine().getSubcommands().keySet()) {
            if (name.equals("help")) {
                continue;
            }
            for (String[] args : List.of(new String[] {name, "--help"}, new String[] {name, "--no-such-option"},
                    new String[] {name, "--version"})) {
                assertEquals(run(InkgateAdmin.commandLine(), args), run(InkgateAdmin.commandLineFor(args), args),
                        String.join(" ", args));
            }
        }
    }

    private static String run(CommandLine cl, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return "exit " + code + "\nout:\n" + out + "\nerr:\n" + err;
    }
}
