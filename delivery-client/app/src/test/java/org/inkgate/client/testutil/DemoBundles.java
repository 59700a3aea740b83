package org.inkgate.client.testutil;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.inkgate.client.demo.DemoBundleBuild;
import org.inkgate.client.demo.DemoSourceException;

/** The demo bundle built by the real build step from src/demo, for tests that need a real bundle. */
public final class DemoBundles {

    /** The demo source folder; surefire runs tests in the module folder. */
    public static final Path SOURCE = Path.of("src", "demo");

    private DemoBundles() {
    }

    /** Builds the demo bundle into {@code folder} and returns its path. */
    public static Path buildInto(Path folder) throws DemoSourceException {
        Path out = folder.resolve("demo.inkexam");
        DemoBundleBuild.build(SOURCE, out);
        return out;
    }

    /** Copies the demo source folder, so a test can break a copy. */
    public static Path copySource(Path folder) throws IOException {
        Path target = folder.resolve("demo-source");
        try (Stream<Path> files = Files.walk(SOURCE)) {
            for (Path file : files.toList()) {
                Path to = target.resolve(SOURCE.relativize(file).toString());
                if (Files.isDirectory(file)) {
                    Files.createDirectories(to);
                } else {
                    Files.copy(file, to);
                }
            }
        }
        return target;
    }
}
