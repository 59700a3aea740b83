package org.inkgate.admin.testutil;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

/** Copies of the invented demo exam source (src/demo) to change in tests. */
public final class DemoSource {

    public static final Path DEMO = Path.of("src/demo");

    private DemoSource() {
    }

    /** Copies src/demo/exam-source to {@code target} and returns it. */
    public static Path copyExam(Path target) throws IOException {
        Path from = DEMO.resolve("exam-source");
        try (Stream<Path> walk = Files.walk(from)) {
            for (Path p : walk.toList()) {
                Path to = target.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(to);
                } else {
                    Files.copy(p, to);
                }
            }
        }
        return target;
    }
}
