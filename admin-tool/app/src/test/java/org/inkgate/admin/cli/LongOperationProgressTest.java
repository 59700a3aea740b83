package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.admin.testutil.ForgedPackages;
import org.inkgate.packs.cli.ProgressReporter;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Progress on the long operations (issue 16 section 2): collect, export, analyse, pack build and
 * bundle with packs, each through the real command line in its own JVM. With standard error in a
 * pipe (a script, a log) they print nothing there; with the reporter's terminal decision made
 * "yes" ({@code -Dinkgate.progress=always}) each draws its counter in place on standard error and
 * standard output is the same as without; in a real pseudo-terminal ({@code script}) collect
 * draws its counter without being told.
 */
class LongOperationProgressTest {

    private static final int PACKAGES = 12; // the demo roster: all present, so collect exits 0
    private static final String PASSPHRASE_ENV = ForgedPackages.PASSPHRASE_ENV;

    @TempDir
    static Path dir;
    static ForgedPackages forged;
    static Path folder;
    static Path ratings;
    static Path exam;

    record Run(int code, String out, String err) {
    }

    @BeforeAll
    static void prepare() throws Exception {
        forged = ForgedPackages.prepare(dir);
        folder = dir.resolve("packages");
        for (int i = 0; i < PACKAGES; i++) {
            String candidate = "H" + (1001 + i);
            forged.write(forged.document(candidate, i), folder.resolve(candidate + ".inkresp"));
        }
        exam = ExamFolders.withTasks(dir.resolve("exam-with-pack"), 2, 2, "latin-square", false); // practice: no roster needed
        ratings = Files.writeString(dir.resolve("ratings.csv"), inventedRatings());
    }

    @Test
    void collectThenExport_inAPipe_printNothingOnStandardError_onATerminal_drawTheirCounters() throws Exception {
        Run quiet = run(false, collectArgs("quiet.db"));
        assertEquals(0, quiet.code(), quiet.out() + quiet.err());
        assertEquals("", quiet.err(), "collect in a pipe");
        Run shown = run(true, collectArgs("shown.db"));
        assertEquals(0, shown.code(), shown.out() + shown.err());
        assertTrue(shown.err().contains("\rcollect: " + PACKAGES + "/" + PACKAGES + " packages (100 %)"), shown.err());
        assertNoNewLines(shown.err());
        assertEquals(quiet.out().replace("quiet.db", "X"), shown.out().replace("shown.db", "X"),
                "standard output is the same either way");

        Run quietExport = run(false, "export", "--store", dir.resolve("quiet.db").toString(), "--out",
                dir.resolve("export-quiet").toString());
        assertEquals(0, quietExport.code(), quietExport.out() + quietExport.err());
        assertEquals("", quietExport.err(), "export in a pipe");
        Run shownExport = run(true, "export", "--store", dir.resolve("quiet.db").toString(), "--out",
                dir.resolve("export-shown").toString());
        assertEquals(0, shownExport.code(), shownExport.out() + shownExport.err());
        // one exam: its three parts, then the move into place (StoreExport.steps)
        assertTrue(shownExport.err().contains("\rexport: 4/4 steps (100 %)"), shownExport.err());
        assertTrue(shownExport.err().contains("moving the files into"), "the commit point is shown: " + shownExport.err());
        assertTrue(shownExport.err().contains("QTI results"), "the part in hand is named: " + shownExport.err());
        assertNoNewLines(shownExport.err());
    }

    @Test
    void analyse_inAPipe_printsNothingOnStandardError_onATerminal_countsItsStages() throws Exception {
        Run quiet = run(false, "analyse", "--ratings", ratings.toString(), "--out", dir.resolve("report-quiet").toString());
        assertEquals(0, quiet.code(), quiet.out() + quiet.err());
        assertEquals("", quiet.err(), "analyse in a pipe");
        Run shown = run(true, "analyse", "--ratings", ratings.toString(), "--out", dir.resolve("report-shown").toString());
        assertEquals(0, shown.code(), shown.out() + shown.err());
        assertTrue(shown.err().contains("\ranalyse: 0/6 stages (0 %) Reading the inputs"), shown.err());
        assertTrue(shown.err().matches("(?s).*\ranalyse: (\\d+)/\\1 stages \\(100 %\\).*"), "ends at the total: " + shown.err());
        assertNoNewLines(shown.err());
    }

    @Test
    void packBuildAndBundleWithPacks_inAPipe_printNothingOnStandardError_onATerminal_drawTheirCounters() throws Exception {
        Path csv = Path.of("../../resource-packs/src/demo/glossary/ferry-terms-en-es.csv");
        List<String> build = new ArrayList<>(List.of("pack", "build", "glossary", "--source", csv.toString(), "--id", "demo-ferry",
                "--pack-version", "1.0", "--title", "Invented term bank", "--licence", "Apache-2.0", "--out"));
        build.add(dir.resolve("quiet.inkpack").toString());
        Run quiet = run(false, build.toArray(String[]::new));
        assertEquals(0, quiet.code(), quiet.out() + quiet.err());
        assertEquals("", quiet.err(), "pack build in a pipe");
        build.set(build.size() - 1, dir.resolve("shown.inkpack").toString());
        Run shown = run(true, build.toArray(String[]::new));
        assertEquals(0, shown.code(), shown.out() + shown.err());
        assertTrue(shown.err().contains("\rpack build: 2/2 stages (100 %)"), shown.err());
        assertTrue(shown.err().contains("indexing"), shown.err());
        assertNoNewLines(shown.err());

        Run quietBundle = run(false, bundleArgs("quiet.inkexam"));
        assertEquals(0, quietBundle.code(), quietBundle.out() + quietBundle.err());
        assertEquals("", quietBundle.err(), "bundle in a pipe");
        Run shownBundle = run(true, bundleArgs("shown.inkexam"));
        assertEquals(0, shownBundle.code(), shownBundle.out() + shownBundle.err());
        assertTrue(shownBundle.err().contains("\rbundle: 0/2 stages (0 %) checking pack test-glossary"), shownBundle.err());
        assertTrue(shownBundle.err().contains("\rbundle: 2/2 stages (100 %)"), shownBundle.err());
        assertNoNewLines(shownBundle.err());
    }

    /** A real pseudo-terminal: util-linux {@code script} runs collect with all three streams on a terminal. */
    @Test
    void collect_inARealPseudoTerminal_drawsItsCounterUnasked() throws Exception {
        Assumptions.assumeTrue(Files.isExecutable(Path.of("/usr/bin/script")), "needs util-linux script");
        List<String> java = javaCommand(false);
        java.addAll(List.of(collectArgs("pty.db")));
        StringBuilder line = new StringBuilder();
        for (String part : java) {
            line.append('\'').append(part.replace("'", "'\\''")).append("' ");
        }
        ProcessBuilder pb = new ProcessBuilder("/usr/bin/script", "-qec", line.toString(), "/dev/null")
                .redirectErrorStream(true).redirectInput(ProcessBuilder.Redirect.PIPE);
        pb.environment().put(PASSPHRASE_ENV, "invented passphrase for a hostile-input test");
        Process p = pb.start();
        p.getOutputStream().close();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), out);
        Assumptions.assumeFalse(out.contains("failed to create pseudo terminal"), "no pseudo-terminals here: " + out);
        assertEquals(0, p.exitValue(), out);
        assertTrue(out.contains("\rcollect: " + PACKAGES + "/" + PACKAGES + " packages (100 %)"), out);
        assertTrue(out.contains("Imported " + PACKAGES + ","), out);
    }

    private static void assertNoNewLines(String err) {
        assertFalse(err.contains("\n"), "the counter stays on one line: " + err);
        assertTrue(err.endsWith("\r"), "the counter is wiped at the end: " + err);
    }

    private static String[] collectArgs(String store) {
        return new String[] {"collect", folder.toString(), "--store", dir.resolve(store).toString(), "--bundle",
            forged.bundle().toString(), "--keys", forged.keys().toString(), "--any-installation", "--passphrase-env",
            PASSPHRASE_ENV};
    }

    private static String[] bundleArgs(String out) {
        return new String[] {"bundle", exam.toString(), "--out", dir.resolve(out).toString(), "--keys",
            forged.keys().toString(), "--passphrase-env", PASSPHRASE_ENV, "--pin-env", "TEST_PIN"};
    }

    /** The admin command line in its own JVM, standard output and error kept apart. */
    private static Run run(boolean terminal, String... args) throws Exception {
        List<String> command = javaCommand(terminal);
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command);
        pb.environment().put(PASSPHRASE_ENV, "invented passphrase for a hostile-input test");
        pb.environment().put("TEST_PIN", "invented-pin-5731");
        Process p = pb.start();
        p.getOutputStream().close();
        CompletableFuture<String> err = CompletableFuture.supplyAsync(() -> read(p.getErrorStream()));
        String out = read(p.getInputStream());
        if (!p.waitFor(300, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new IllegalStateException("inkgate-admin " + args[0] + " did not finish in 300 s: " + out);
        }
        return new Run(p.exitValue(), out, err.get());
    }

    private static List<String> javaCommand(boolean terminal) {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED"));
        if (terminal) {
            command.add("-D" + ProgressReporter.OVERRIDE_PROPERTY + "=always");
        }
        command.addAll(List.of("-cp", System.getProperty("java.class.path"), InkgateAdmin.class.getName()));
        return command;
    }

    private static String read(java.io.InputStream in) {
        try {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** Invented ratings (not a real sitting): 12 candidates, 2 tasks, 2 conditions, 2 raters, 2 criteria. */
    private static String inventedRatings() {
        StringBuilder csv = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        int n = 0;
        for (int c = 1; c <= 12; c++) {
            String form = c % 2 == 0 ? "F1" : "F2";
            for (int t = 1; t <= 2; t++) {
                String condition = (t == 1) == form.equals("F1") ? "with" : "without";
                for (String rater : List.of("R1", "R2")) {
                    for (String criterion : List.of("content", "language")) {
                        csv.append(String.format("C%02d,%s,%s,t%d,%s,%s,%s,%d%n", c, c <= 6 ? "B1" : "B2", form, t,
                                condition, rater, criterion, 3 + (n++ * 7 + c) % 5));
                    }
                }
            }
        }
        return csv.toString();
    }
}
