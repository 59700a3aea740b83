package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/** Every command a guide names is reachable from the one root command. */
class RootCommandTest {

    @Test
    void root_listsEveryCommandTheGuidesName() {
        var names = InkgateAdmin.commandLine().getSubcommands().keySet();
        for (String name : List.of("keys", "exam", "forms", "roster", "bundle", "inspect", "collect", "missing",
                "export", "analyse", "pack")) {
            assertTrue(names.contains(name), name + " is a subcommand of inkgate-admin: " + names);
        }
    }

    @Test
    void packVerifyHelp_throughTheRoot_printsItsUsage() {
        StringWriter out = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out));
        assertEquals(0, cli.execute("pack", "verify", "--help"));
        assertTrue(out.toString().contains("verify"), out.toString());
    }

    @Test
    void analyseHelp_throughTheRoot_printsItsOptions() {
        StringWriter out = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out));
        assertEquals(0, cli.execute("analyse", "--help"));
        assertTrue(out.toString().contains("--ratings"), out.toString());
    }
}
