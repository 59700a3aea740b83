package org.inkgate.packs.testutil;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

/** The packs the module build writes in process-classes (see the exec-maven-plugin in the module pom). */
public final class BuiltPacks {
    private BuiltPacks() {
    }

    /** The WordNet 3.1 dictionary pack. */
    public static Path wordnet() {
        return existing("wordnet-3.1-en.inkpack");
    }

    /** The invented English-Spanish demo glossary pack. */
    public static Path demoGlossary() {
        return existing("demo-ferry-en-es.inkpack");
    }

    /** A folder for extracted packs under the build's temporary folder. */
    public static Path work() {
        return Path.of(System.getProperty("inkgate.tmpdir", System.getProperty("java.io.tmpdir")));
    }

    private static Path existing(String name) {
        Path p = Path.of(System.getProperty("inkgate.packs.dir", "target/packs"), name);
        assertTrue(Files.isRegularFile(p), p + " is missing: run the module build through process-classes (mvn -pl resource-packs verify)");
        return p;
    }
}
