package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.open.SittingBundleOpener;
import org.inkgate.client.sitting.open.SittingLoad;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.StudyDesign;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The invented three-condition demo (src/demo/three-conditions, a parallel design) through the real
 * command line in separate processes: it checks, assigns with its balance shown, refuses a roster
 * that cannot be balanced exactly, and bundles; the delivery client's own opener then opens the
 * bundle and every candidate's plan holds one condition for both tasks.
 */
class ThreeConditionDemoTest {

    private static final Path DEMO = Path.of("src/demo");
    private static final Path SOURCE = DEMO.resolve("three-conditions");

    @TempDir
    Path dir;

    record Run(int code, String out) {
    }

    private Run admin(String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED", "-cp", System.getProperty("java.class.path"),
                InkgateAdmin.class.getName()));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true);
        pb.environment().put("TEST_PASSPHRASE", "invented passphrase for the demo");
        pb.environment().put("TEST_PIN", "invented-pin-8642");
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS));
        return new Run(p.exitValue(), out);
    }

    @Test
    void threeConditionDemo_checksAssignsBundlesAndOpensInTheClient() throws Exception {
        Run init = admin("keys", "init", "--keys", dir.resolve("keys").toString(), "--passphrase-env", "TEST_PASSPHRASE");
        assertEquals(0, init.code(), init.out());
        Matcher fingerprint = Pattern.compile("signing key \\(Ed25519\\)\\s+fingerprint (\\S+)").matcher(init.out());
        assertTrue(fingerprint.find(), init.out());

        Run check = admin("exam", "check", SOURCE.toString());
        assertEquals(0, check.code(), check.out());

        String assignment = dir.resolve("assignment.csv").toString();
        Run forms = admin("forms", SOURCE.toString(), "--roster", DEMO.resolve("roster.csv").toString(), "--seed", "7",
                "--out", assignment);
        assertEquals(0, forms.code(), forms.out());
        assertTrue(forms.out().contains("design: parallel (between candidates): each candidate sits all 2 tasks under one"
                + " of 3 conditions (no-tools, spelling-only, spelling-and-grammar), allocation ratio 1:1:1"), forms.out());
        assertTrue(forms.out().contains("forms: 6 = 3 groups x 2 task orders"), forms.out());
        // roster.csv: 6 candidates in each of two levels, so every level gives each condition 2 (6 = 1:1:1 x 2 orders)
        assertTrue(forms.out().contains("allocation ratio achieved: 1.00:1.00:1.00 (stated 1:1:1)"), forms.out());
        String second = dir.resolve("assignment-again.csv").toString();
        Run again = admin("forms", SOURCE.toString(), "--roster", DEMO.resolve("roster.csv").toString(), "--seed", "7",
                "--out", second);
        assertEquals(0, again.code(), again.out());
        assertEquals(13, Files.readAllLines(Path.of(assignment)).size(), "header and 12 candidates");
        assertEquals(Files.readString(Path.of(assignment)), Files.readString(Path.of(second)), "same seed, same table");

        String bundle = dir.resolve("three.inkexam").toString();
        Run built = admin("bundle", SOURCE.toString(), "--out", bundle, "--keys", dir.resolve("keys").toString(),
                "--roster", DEMO.resolve("roster.csv").toString(), "--assignment", assignment,
                "--passphrase-env", "TEST_PASSPHRASE", "--pin-env", "TEST_PIN");
        assertEquals(0, built.code(), built.out());

        SittingLoad load = new SittingBundleOpener(java.util.Set.of(fingerprint.group(1))).open(Path.of(bundle));
        SittingLoad.Opened opened = assertInstanceOf(SittingLoad.Opened.class, load, load.toString());
        try (var b = opened.bundle()) {
            BundleManifest m = b.manifest();
            assertEquals(StudyDesign.PARALLEL, m.design());
            assertEquals(3, m.conditions().size());
            Map<String, Integer> perCondition = new TreeMap<>();
            for (var entry : m.roster()) {
                SittingPlan plan = SittingPlan.forCandidate(m, "sha", bundle, entry.candidateNumber(), "seat", null, "test");
                List<String> conditions = plan.form().slots().stream().map(FormSlot::conditionId).distinct().toList();
                assertEquals(1, conditions.size(), "a parallel form holds one condition: " + conditions);
                assertEquals(2, plan.form().slots().size());
                perCondition.merge(conditions.get(0), 1, Integer::sum);
            }
            assertEquals(Map.of("no-tools", 4, "spelling-and-grammar", 4, "spelling-only", 4), perCondition);
        }
    }

    @Test
    void forms_rosterThatCannotBeBalancedExactly_isRefusedSayingWhatWouldBalanceIt() throws Exception {
        List<String> lines = Files.readAllLines(DEMO.resolve("roster.csv"));
        Path eleven = dir.resolve("roster-11.csv");
        Files.write(eleven, lines.subList(0, lines.size() - 1));
        Run forms = admin("forms", SOURCE.toString(), "--roster", eleven.toString(), "--seed", "7");
        assertEquals(InkgateAdmin.PROBLEMS, forms.code(), forms.out());
        assertTrue(forms.out().contains("has 5 candidates; exact balance needs a multiple of 6 (blocks of 3 for the ratio"
                + " 1:1:1 times 2 task orders): add 1 or remove 5 candidates, or set exactBalance: false"), forms.out());
    }
}
