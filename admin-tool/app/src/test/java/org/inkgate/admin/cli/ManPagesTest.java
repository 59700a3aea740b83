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

    /**
     * The troff pages pass groff's own check of the man macros (GNU groff from Debian, {@code groff
     * -man -ww -z}: every warning enabled, none printed) and, rendered as {@code man} renders them,
     * name each option of their command and the command's one-line summary.
     */
    @Test
    void write_troffPages_passGroffsChecks_andNameEveryOption() throws Exception {
        assertEquals(0, ManPages.write(dir.toFile()));
        List<CommandLine> commands = new ArrayList<>();
        collect(InkgateAdmin.commandLine(), commands);
        for (CommandLine c : commands) {
            String name = c.getCommandSpec().qualifiedName("-");
            Path page = dir.resolve("man1").resolve(name + ".1");
            assertTrue(Files.isRegularFile(page), "no troff page for " + name);
            Run check = groff(page, "-man", "-ww", "-z");
            assertEquals(0, check.code(), name + ": " + check.err());
            assertEquals("", check.err(), name + ": groff warnings");
            // rendered without hyphenation and with runs of justification spaces made one, so names can be found
            Run shown = groff(page, "-man", "-rHY=0", "-Tutf8", "-P-cbou");
            String text = shown.out().replace('\u2212', '-').replace('\u2010', '-').replaceAll("\\s+", " ");
            assertTrue(text.contains(name + " - "), name + ": NAME line\n" + text);
            for (CommandLine.Model.OptionSpec o : c.getCommandSpec().options()) {
                if (!o.hidden()) {
                    assertTrue(text.contains(o.longestName()), name + " page lacks " + o.longestName() + "\n" + text);
                }
            }
        }
    }

    @Test
    void troffPage_textThatLooksLikeARequest_isPrintedAsWritten() throws Exception {
        assertEquals("\\&.so /etc/passwd", TroffPage.escape(".so /etc/passwd"));
        assertEquals("\\&'br", TroffPage.escape("'br"));
        assertEquals("a \\e\\- b", TroffPage.escape("a \\- b"));
    }

    record Run(int code, String out, String err) {
    }

    private static Run groff(Path page, String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of("groff"));
        cmd.addAll(List.of(args));
        cmd.add(page.toString());
        Process p;
        try {
            p = new ProcessBuilder(cmd).start();
        } catch (java.io.IOException e) {
            throw new AssertionError("this check runs GNU groff, which is not installed here: install it (Debian:"
                    + " apt-get install groff-base; .ci/run does so) and run the test again", e);
        }
        var out = p.getInputStream().readAllBytes();
        var err = p.getErrorStream().readAllBytes();
        return new Run(p.waitFor(), new String(out, java.nio.charset.StandardCharsets.UTF_8),
                new String(err, java.nio.charset.StandardCharsets.UTF_8));
    }

    private static void collect(CommandLine c, List<CommandLine> out) {
        out.add(c);
        c.getSubcommands().values().stream().distinct().forEach(s -> collect(s, out));
    }
}
