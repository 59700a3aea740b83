package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The launcher script runs {@code analyse} with the C1 compiler only (issue 16: the whole command
 * under 2 s; docs/benchmarks.md), {@code collect} with C2 taking methods ten times later (issue 16:
 * fewer compilations in a fresh collect), and every other command with the JVM's usual compilers. The real
 * script runs from a copy beside a stand-in build, with a stand-in {@code java} that prints the
 * arguments it was given.
 */
class LauncherJitFlagsTest {

    @TempDir
    Path dir;

    @Test
    void analyse_runsWithC1Only() throws Exception {
        List<String> args = javaArguments("analyse", "--ratings", "r.csv", "--out", "out");
        assertTrue(args.contains("-XX:TieredStopAtLevel=1"), args.toString());
        assertEquals(List.of("org.inkgate.admin.cli.InkgateAdmin", "analyse", "--ratings", "r.csv", "--out", "out"),
                args.subList(args.size() - 6, args.size()));
    }

    @Test
    void collect_takesMethodsToC2TenTimesLater() throws Exception {
        List<String> args = javaArguments("collect", "--store", "s.db", "in");
        assertTrue(args.containsAll(List.of("-XX:Tier4InvocationThreshold=50000", "-XX:Tier4MinInvocationThreshold=6000",
                "-XX:Tier4CompileThreshold=150000", "-XX:Tier4BackEdgeThreshold=400000")), args.toString());
        assertFalse(args.stream().anyMatch(a -> a.startsWith("-XX:TieredStopAtLevel")), args.toString());
        assertTrue(args.contains("-XX:+UseSerialGC"), args.toString());
        // the GCM classes compiled early, not the whole crypto provider (key schedules, HMAC)
        assertTrue(args.contains("-XX:CompileCommand=CompileThresholdScaling,com.sun.crypto.provider.G*::*,0.01"), args.toString());
        assertFalse(args.stream().anyMatch(a -> a.contains("com.sun.crypto.provider.*::*")), args.toString());
        assertEquals(List.of("org.inkgate.admin.cli.InkgateAdmin", "collect", "--store", "s.db", "in"),
                args.subList(args.size() - 5, args.size()));
    }

    @Test
    void otherCommands_keepTheUsualCompilers() throws Exception {
        for (String command : List.of("bundle", "gui", "export", "--help")) {
            List<String> args = javaArguments(command);
            assertFalse(args.stream().anyMatch(a -> a.startsWith("-XX:TieredStopAtLevel") || a.startsWith("-XX:Tier4")
                    || a.equals("-XX:+UseSerialGC")),
                    command + ": " + args);
            assertEquals(command, args.get(args.size() - 1));
        }
    }

    private List<String> javaArguments(String... commandLine) throws IOException, InterruptedException {
        return new StandInLauncher(dir).run(commandLine);
    }
}
