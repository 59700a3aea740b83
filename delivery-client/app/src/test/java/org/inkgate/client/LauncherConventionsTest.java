package org.inkgate.client;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;
import org.w3c.dom.Node;

/**
 * The client's launcher, run as its script runs it (its own JVM, the real main class), keeps the
 * command-line conventions: --help and --version exit 0, --version prints the parent pom's
 * version, a wrong argument exits 2, and nothing else reaches standard error (no logging or JVM
 * notices).
 */
class LauncherConventionsTest {

    record Run(int code, String out, String err) {
    }

    private static Run launch(String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED", "-cp", System.getProperty("java.class.path"),
                Launcher.class.getName()));
        command.addAll(List.of(args));
        Process p = new ProcessBuilder(command).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        return new Run(p.exitValue(), out, err);
    }

    @Test
    void version_printsTheParentPomVersion() throws Exception {
        Run r = launch("--version");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().startsWith("inkgate-client " + pomVersion() + System.lineSeparator()), r.out());
        assertEquals("", r.err());
    }

    @Test
    void help_printsUsageNamingVersion() throws Exception {
        Run r = launch("--help");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().startsWith("Usage: inkgate-client"), r.out());
        assertTrue(r.out().contains("--version"), r.out());
        assertEquals("", r.err());
    }

    @Test
    void unknownArgument_exitsWithWrongUsage() throws Exception {
        Run r = launch("--no-such-option");
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("--no-such-option"), r.err());
    }

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
