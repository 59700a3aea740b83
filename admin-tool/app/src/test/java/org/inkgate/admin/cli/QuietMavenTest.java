package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * Maven itself runs quiet on JDK 23+: Maven 3.8/3.9 bring a Guava that calls
 * {@code sun.misc.Unsafe::objectFieldOffset}, and JDK 24+ print a four-line warning for it on
 * every run. The repository's {@code .mvn/jvm.config} allows that access the supported way (JEP
 * 471's {@code --sun-misc-unsafe-memory-access=allow}); {@code -XX:+IgnoreUnrecognizedVMOptions}
 * lets an older JDK start Maven anyway, so the build's own JDK check can say what to install.
 * This runs the real {@code mvn} on the parent pom alone (offline); skipped where there is none.
 */
class QuietMavenTest {

    @Test
    void mvn_onThisJdk_printsNoUnsafeWarning() throws Exception {
        Path root = Path.of("../..").toAbsolutePath().normalize();
        Assumptions.assumeTrue(Files.isRegularFile(root.resolve(".mvn/jvm.config")) && Files.isExecutable(Path.of("/usr/bin/mvn")),
                "needs the repository root and mvn");
        ProcessBuilder pb = new ProcessBuilder(List.of("/usr/bin/mvn", "-B", "-q", "-o", "-N", "validate"))
                .directory(root.toFile()).redirectErrorStream(true);
        pb.environment().put("JAVA_HOME", System.getProperty("java.home"));
        pb.environment().remove("MAVEN_OPTS");
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(300, TimeUnit.SECONDS)) {
            p.destroyForcibly();
        }
        assertEquals(0, p.exitValue(), out);
        assertFalse(out.contains("sun.misc.Unsafe") || out.contains("WARNING"), out);
    }
}
