package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Normal runs of the real admin tool, each in its own JVM with the launcher script's flags, print
 * nothing on standard error: no SLF4J "no providers" lines, no java.util.logging notices, no stack
 * traces. A read-only command on a store that does not exist is refused instead of creating an empty
 * one, and {@code pack build dictionary} without WordNet says how to build the pack.
 */
class QuietRunTest {

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    static Run admin(Path workDir, String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED"));
        if (Runtime.version().feature() >= 23) {
            command.add("--sun-misc-unsafe-memory-access=allow");
        }
        command.addAll(List.of("-cp", System.getProperty("java.class.path"), InkgateAdmin.class.getName()));
        command.addAll(List.of(args));
        Process p = new ProcessBuilder(command).directory(workDir.toFile()).start();
        p.getOutputStream().close();
        var err = p.getErrorStream();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        String errText = new String(err.readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS));
        return new Run(p.exitValue(), out, errText);
    }

    @Test
    void missing_onAnExistingStore_printsNoLoggingNotices() throws Exception {
        Path store = dir.resolve("results.db");
        StoreFixture.of(store).results().close();
        Run r = admin(dir, "missing", "--store", store.toString());
        assertEquals(0, r.code(), r.out() + r.err());
        assertEquals("", r.err(), "standard error of a normal run");
    }

    @Test
    void packSearch_onTheDemoGlossary_printsNoLoggingNotices() throws Exception {
        Path pack = Path.of("../../resource-packs/target/packs/demo-ferry-en-es.inkpack").toAbsolutePath();
        Run r = admin(dir, "pack", "search", pack.toString(), "ferry");
        assertEquals(0, r.code(), r.out() + r.err());
        assertEquals("", r.err(), "standard error of a normal run");
    }

    @Test
    void missingAndExport_onAStoreThatDoesNotExist_areRefusedAndCreateNothing() throws Exception {
        Run missing = admin(dir, "missing", "--store", "no-such.db");
        assertEquals(InkgateAdmin.PROBLEMS, missing.code(), missing.out() + missing.err());
        assertTrue(missing.err().contains("no results store at"), missing.err());
        assertTrue(missing.err().contains("collect"), missing.err());

        Run export = admin(dir, "export", "--store", "no-such.db", "--out", "exported");
        assertEquals(InkgateAdmin.PROBLEMS, export.code(), export.out() + export.err());
        assertTrue(export.err().contains("no results store at"), export.err());

        try (var left = Files.list(dir)) {
            assertEquals(List.of(), left.toList(), "neither command created a store or a folder");
        }
    }

    @Test
    void packBuildDictionary_withoutWordNet_saysHowToBuildIt() throws Exception {
        Run r = admin(dir, "pack", "build", "dictionary", "--out", "wordnet.inkpack");
        assertEquals(4, r.code(), r.out() + r.err()); // docs/resource-packs.md: 4, the source cannot be used
        assertTrue(r.err().contains("mvn -q -B -pl resource-packs package"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        assertFalse(Files.exists(dir.resolve("wordnet.inkpack")));
    }
}
