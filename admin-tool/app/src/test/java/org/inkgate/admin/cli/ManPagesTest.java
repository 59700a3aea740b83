package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The manual pages come from the same command tree the launcher runs: one page per command and
 * subcommand, each naming every option the command has, so a page can never describe a command
 * the program does not have.
 */
class ManPagesTest {

    @TempDir
    Path dir;

    @Test
    void write_everyCommand_hasAPageNamingEachOfItsOptions() throws Exception {
        assertEquals(0, ManPages.write(dir.toFile()));
        List<CommandLine> commands = new ArrayList<>();
        collect(InkgateAdmin.commandLine(), commands);
        assertTrue(commands.size() > 30, "commands found: " + commands.size());
        for (CommandLine c : commands) {
            String name = c.getCommandSpec().qualifiedName("-");
            Path page = dir.resolve(name + ".adoc");
            assertTrue(Files.isRegularFile(page), "no manual page for " + name);
            String text = Files.readString(page);
            assertTrue(text.contains("= " + name + "(1)"), name + ": page title");
            for (CommandLine.Model.OptionSpec o : c.getCommandSpec().options()) {
                if (!o.hidden()) {
                    assertTrue(text.contains(o.longestName()), name + " page lacks " + o.longestName());
                }
            }
        }
    }

    private static void collect(CommandLine c, List<CommandLine> out) {
        out.add(c);
        c.getSubcommands().values().stream().distinct().forEach(s -> collect(s, out));
    }
}
