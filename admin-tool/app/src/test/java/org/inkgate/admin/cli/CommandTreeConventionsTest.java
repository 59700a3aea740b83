package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import picocli.CommandLine;

/**
 * Every command and subcommand of the real {@code inkgate-admin} tree keeps the conventions the
 * test owner's guide states ("Every command has --help. Exit codes: 0 done, ... 2 wrong usage"):
 * {@code --help} prints usage and exits 0, {@code --version} prints the release number of the
 * parent pom and exits 0, an unknown option exits 2. The tree is enumerated, not listed, so a new
 * command is checked the day it is added.
 */
class CommandTreeConventionsTest {

    static Stream<List<String>> commandPaths() {
        List<List<String>> paths = new ArrayList<>();
        collect(InkgateAdmin.commandLine(), new ArrayList<>(), paths);
        assertTrue(paths.size() > 30, "the tree has its commands: " + paths);
        return paths.stream();
    }

    private static void collect(CommandLine cl, List<String> prefix, List<List<String>> out) {
        out.add(List.copyOf(prefix));
        cl.getSubcommands().forEach((name, sub) -> {
            if (sub.getCommandSpec().userObject() instanceof CommandLine.HelpCommand
                    || !name.equals(sub.getCommandName())) {
                return; // picocli's own help command, and aliases of a command already walked
            }
            List<String> next = new ArrayList<>(prefix);
            next.add(name);
            collect(sub, next, out);
        });
    }

    /** Output, error and exit code of one run through the launcher's own command line. */
    record Run(int code, String out, String err) {
    }

    private static Run run(List<String> path, String... more) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        List<String> args = new ArrayList<>(path);
        args.addAll(List.of(more));
        int code = cl.execute(args.toArray(String[]::new));
        return new Run(code, out.toString(), err.toString());
    }

    @ParameterizedTest(name = "inkgate-admin {0} --help")
    @MethodSource("commandPaths")
    void help_onEveryCommand_printsUsageAndExitsZero(List<String> path) {
        Run r = run(path, "--help");
        assertEquals(0, r.code(), path + " --help: " + r.err());
        assertTrue(r.out().startsWith("Usage: inkgate-admin"), r.out());
        assertTrue(r.out().contains("--version"), r.out());
    }

    @ParameterizedTest(name = "inkgate-admin {0} --version")
    @MethodSource("commandPaths")
    void version_onEveryCommand_printsThePomVersion(List<String> path) throws Exception {
        Run r = run(path, "--version");
        assertEquals(0, r.code(), path + " --version: " + r.err());
        assertTrue(r.out().startsWith("inkgate-admin " + pomVersion() + System.lineSeparator()), r.out());
        assertFalse(r.out().contains("development"), r.out());
    }

    @ParameterizedTest(name = "inkgate-admin {0} --no-such-option")
    @MethodSource("commandPaths")
    void unknownOption_onEveryCommand_exitsWithWrongUsage(List<String> path) {
        Run r = run(path, "--no-such-option");
        assertEquals(2, r.code(), path + ": " + r.out() + r.err());
        // picocli names the first problem it meets: the unknown option, or a required option it lacks
        assertTrue(r.err().contains("Usage: inkgate-admin"), r.err());
    }

    /** The version the parent pom declares: the number every launcher must print. */
    static String pomVersion() throws Exception {
        var factory = DocumentBuilderFactory.newInstance();
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Element project = factory.newDocumentBuilder().parse(Path.of("../../pom.xml").toFile()).getDocumentElement();
        for (Node n = project.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element e && e.getTagName().equals("version")) {
                return e.getTextContent().strip();
            }
        }
        throw new AssertionError("the parent pom has no <version>");
    }
}
