package org.inkgate.admin.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyPair;
import java.util.Base64;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.admin.core.collection.Outcome;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.admin.testutil.DemoSource;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Drives the real admin window headless (Monocle) over the invented demo exam source, step by
 * step as a test owner would, and writes a screenshot of every step (docs/screenshots/README.md).
 * Expected values come from the demo files themselves (src/demo/roster.csv: 12 invented
 * candidates, 6 at each of two levels) and from what the test plants, never from the code under test.
 */
@ExtendWith(ApplicationExtension.class)
class AdminWindowTest {

    private static final char[] PASSPHRASE = "invented passphrase for the demo".toCharArray();
    private static final String LEFT_OUT = "H1012";

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void walkthrough_demoExam_everyStepShowsWhatTheTestOwnerNeeds(FxRobot robot) throws Exception {
        Path keys = dir.resolve("keys");
        new OwnerKeyStore(keys).init(PASSPHRASE);
        AdminSession session = new AdminSession();
        AtomicReference<Scene> scene = new AtomicReference<>();
        robot.interact(() -> scene.set(AdminWindow.show(stage, session)));

        // 1. exam check: a planted problem is listed with the line it is on
        Path broken = DemoSource.copyExam(dir.resolve("broken"));
        Path examYaml = broken.resolve("exam.yaml");
        // three planted problems in different fields: the whole folder is checked at once
        String yaml = Files.readString(examYaml).replace("prompt: prompts/ferry-complaint.md",
                "prompt: prompts/no-such-prompt.md").replace("words: {min: 180, max: 250}", "words: {min: 250, max: 180}")
                .replace("paste: none", "paste: sometimes");
        Files.writeString(examYaml, yaml);
        int plantedLine = lineOf(yaml, "prompts/no-such-prompt.md");
        int swappedLine = lineOf(yaml, "words: {min: 250, max: 180}");
        int pasteLine = lineOf(yaml, "paste: sometimes");
        setText(robot, "#examFolder", broken.toString());
        robot.clickOn("#checkExam");
        WaitForAsyncUtils.waitForFxEvents();
        TableView<Problem> problems = robot.lookup("#problems").queryTableView();
        assertEquals(3, problems.getItems().size(), "the three planted problems: " + problems.getItems());
        for (int line : new int[] {plantedLine, swappedLine, pasteLine}) {
            assertTrue(problems.getItems().stream().anyMatch(p -> p.file().equals("exam.yaml") && p.line() == line
                    && !p.field().isBlank() && !p.message().isBlank()),
                    "a problem on exam.yaml line " + line + ": " + problems.getItems());
        }
        assertTrue(label(robot, "#examSummary").startsWith("3 problems"), label(robot, "#examSummary"));
        shoot(robot, scene.get(), "admin-exam-check.png");

        Path exam = DemoSource.copyExam(dir.resolve("exam-source"));
        setText(robot, "#examFolder", exam.toString());
        robot.clickOn("#checkExam");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(label(robot, "#examSummary").startsWith("No problems found"), label(robot, "#examSummary"));

        // preview from the exam step: a second window, marked as a preview, on the chosen task
        robot.interact(() -> {
            robot.lookup("#previewTask").queryComboBox().setValue("market-square");
            robot.lookup("#previewCondition").queryComboBox().setValue("without-resources");
        });
        robot.clickOn("#openPreview");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(label(robot, "#previewMessage").startsWith("Preview window opened: task market-square under"
                + " without-resources"), label(robot, "#previewMessage"));
        List<javafx.stage.Window> previews = javafx.stage.Window.getWindows().stream()
                .filter(w -> w != stage && w instanceof Stage s && s.getTitle() != null
                        && s.getTitle().startsWith("PREVIEW (not a locked sitting)")).toList();
        assertEquals(1, previews.size(), "one preview window");
        robot.interact(() -> ((Stage) previews.get(0)).close());

        // keyboard: Ctrl+2 opens the forms step
        robot.press(KeyCode.CONTROL, KeyCode.DIGIT2).release(KeyCode.DIGIT2, KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        ListView<?> steps = robot.lookup("#steps").queryListView();
        assertEquals(1, steps.getSelectionModel().getSelectedIndex());

        // 2. forms: 12 candidates, 6 per level (src/demo/roster.csv), spread over the forms; a copy beside the
        // exam, as a test owner keeps it, so the pictures show no path of the repository
        Path rosterCopy = Files.copy(DemoSource.DEMO.resolve("roster.csv"), dir.resolve("roster.csv"));
        setText(robot, "#roster", rosterCopy.toString());
        setText(robot, "#seed", "20261202");
        robot.clickOn("#assign");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(label(robot, "#formsResult").startsWith("Roster: 12 candidates, per level {B1=6, B2=6}"),
                label(robot, "#formsResult"));
        assertTrue(label(robot, "#formsResult").contains("12 candidates assigned with seed 20261202"),
                label(robot, "#formsResult"));
        for (String level : List.of("B1", "B2")) {
            int sum = 0;
            int min = Integer.MAX_VALUE;
            int max = 0;
            for (String form : List.of("F01", "F02", "F03", "F04")) {
                int n = Integer.parseInt(label(robot, "#count-" + level + "-" + form));
                sum += n;
                min = Math.min(min, n);
                max = Math.max(max, n);
            }
            assertEquals(6, sum, "level " + level + " has 6 candidates in src/demo/roster.csv");
            // the rule: within a level, forms at most one apart when the level does not divide evenly
            assertTrue(max - min <= 1, level + ": " + min + ".." + max);
        }
        // the rule: every task under every condition equally often; 12 candidates each sit both tasks
        // once under each condition, so 6 and 6 per task
        String cells = label(robot, "#taskConditionCounts");
        assertTrue(cells.contains("ferry-complaint:  with-resources=6  without-resources=6"), cells);
        assertTrue(cells.contains("market-square:  with-resources=6  without-resources=6"), cells);
        // the same balance lines as the forms command: 6 of the 12 write each task first
        assertTrue(cells.lines().anyMatch(l -> l.strip().matches("all levels +6 +6")), cells);
        assertTrue(Files.isRegularFile(session.assignment().get()));
        shoot(robot, scene.get(), "admin-forms.png");

        // 3. bundle: sealed first (the release code is shown once), then the unsealed one collected below
        select(robot, 2);
        setText(robot, "#keys", keys.toString());
        Path sealedFile = dir.resolve("sealed.inkexam");
        setText(robot, "#bundleOut", sealedFile.toString());
        fillSecrets(robot);
        robot.interact(() -> robot.lookup("#seal").queryAs(CheckBox.class).setSelected(true));
        robot.clickOn("#buildBundle");
        waitForWork(session);
        String code = label(robot, "#releaseCode");
        assertFalse(code.isEmpty(), label(robot, "#bundleResult"));
        try (OpenedBundle b = ownerReader(keys).open(sealedFile)) {
            assertTrue(b.sealed());
            assertFalse(b.readable(), "sealed: prompts stay closed until the code is given");
            b.unseal(code.toCharArray());
            assertTrue(b.readable(), "the code shown on screen opens the bundle");
        }
        scrollToEnd(robot);
        shoot(robot, scene.get(), "admin-bundle-sealed.png");
        robot.interact(() -> robot.lookup("#codeStored").queryButton().fire());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("", label(robot, "#releaseCode"));

        Path bundleFile = dir.resolve("demo.inkexam");
        setText(robot, "#bundleOut", bundleFile.toString());
        fillSecrets(robot);
        robot.interact(() -> robot.lookup("#seal").queryAs(CheckBox.class).setSelected(false));
        robot.clickOn("#buildBundle");
        waitForWork(session);
        assertTrue(label(robot, "#bundleResult").startsWith("Bundle written"), label(robot, "#bundleResult"));
        List<RosterEntry> roster;
        try (OpenedBundle b = ownerReader(keys).open(bundleFile)) {
            assertTrue(b.readable());
            roster = b.manifest().roster();
            assertEquals(12, roster.size(), "every candidate of src/demo/roster.csv");
        }

        // 4. collect: simulated packages for all but one candidate, a tampered copy, a byte-identical copy
        // and a second, different package for one candidate (a conflict)
        Path packages = dir.resolve("packages");
        writeSimulatedPackages(keys, bundleFile, packages);
        byte[] bytes = Files.readAllBytes(packages.resolve("H1001.inkresp"));
        bytes[bytes.length / 2] ^= 0x01;
        Files.write(packages.resolve("H1001-tampered.inkresp"), bytes);
        Files.copy(packages.resolve("H1002.inkresp"), packages.resolve("H1002-copy.inkresp"));
        writeSecondPackage(keys, bundleFile, "H1003", packages.resolve("H1003-second.inkresp"));
        select(robot, 3);
        robot.interact(() -> robot.lookup("#packageFolders").queryAs(TextArea.class).setText(packages.toString()));
        robot.interact(() -> robot.lookup("#anyInstallation").queryAs(CheckBox.class).setSelected(true));
        setText(robot, "#collectPassphrase", new String(PASSPHRASE));
        robot.clickOn("#collect");
        waitForWork(session);
        String counts = label(robot, "#collectCounts");
        // 11 written + the second H1003 package imported; the identical copy changes nothing; the tampered one refused
        assertTrue(counts.startsWith("Imported 12, already imported (same file) 1, copies of imported packages 0,"
                + " refused 1."), counts);
        String details = label(robot, "#collectDetails");
        assertTrue(details.contains("CONFLICTS") && details.contains("candidate H1003"), details);
        TableView<Outcome.Refused> refused = robot.lookup("#refused").queryTableView();
        assertEquals(1, refused.getItems().size());
        assertTrue(refused.getItems().get(0).file().endsWith("H1001-tampered.inkresp"));
        assertFalse(refused.getItems().get(0).reason().isBlank());
        assertFalse(refused.getItems().get(0).message().isBlank());
        // the picture shows the results: scroll the step to its end
        scrollToEnd(robot);
        shoot(robot, scene.get(), "admin-collect.png");

        // 5. missing: the candidate left out is named
        select(robot, 4);
        robot.clickOn("#showMissing");
        WaitForAsyncUtils.waitForFxEvents();
        String missing = label(robot, "#missingReport");
        assertTrue(missing.contains("candidate " + LEFT_OUT), missing);
        assertFalse(missing.contains("candidate H1001"), missing);
        assertTrue(missing.contains("follow your regulations"), missing);
        shoot(robot, scene.get(), "admin-missing.png");
    }

    @Test
    void bundle_wrongPassphrase_showsAPlainMessageAndWritesNothing(FxRobot robot) throws Exception {
        Path keys = dir.resolve("keys");
        new OwnerKeyStore(keys).init(PASSPHRASE);
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        setText(robot, "#examFolder", DemoSource.copyExam(dir.resolve("exam-source")).toString());
        robot.clickOn("#checkExam");
        select(robot, 1);
        setText(robot, "#roster", DemoSource.DEMO.resolve("roster.csv").toAbsolutePath().toString());
        robot.clickOn("#assign");
        select(robot, 2);
        setText(robot, "#keys", keys.toString());
        Path out = dir.resolve("never.inkexam");
        setText(robot, "#bundleOut", out.toString());
        setText(robot, "#passphrase", "not the passphrase");
        setText(robot, "#pin", "invented-pin-8642");
        setText(robot, "#pinAgain", "invented-pin-8642");
        robot.clickOn("#buildBundle");
        waitForWork(session);
        String result = label(robot, "#bundleResult");
        assertTrue(result.startsWith("The bundle was not built."), result);
        assertTrue(result.contains("passphrase"), result);
        assertFalse(result.contains("\tat ") || result.contains("Exception"), "no stack trace: " + result);
        assertFalse(Files.exists(out));
    }

    /**
     * The invented three-condition parallel demo (src/demo/three-conditions, 1:1:1 over two task
     * orders) with the demo roster (6 per level): the step shows the design in words before any
     * assignment, then the allocation per stratum and condition and the ratio achieved.
     */
    @Test
    void forms_parallelThreeConditionDemo_showsTheDesignAndItsAllocation(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        AtomicReference<Scene> scene = new AtomicReference<>();
        robot.interact(() -> scene.set(AdminWindow.show(stage, session)));
        setText(robot, "#examFolder", DemoSource.DEMO.resolve("three-conditions").toAbsolutePath().toString());
        robot.clickOn("#checkExam");
        select(robot, 1);
        String design = label(robot, "#formsText");
        assertTrue(design.startsWith("design: parallel (between candidates): each candidate sits all 2 tasks under one of"
                + " 3 conditions"), design);
        assertTrue(design.contains("exact balance needs every stratum to hold a multiple of 6 candidates"), design);
        setText(robot, "#roster", DemoSource.DEMO.resolve("roster.csv").toAbsolutePath().toString());
        setText(robot, "#seed", "7");
        setText(robot, "#assignmentOut", dir.resolve("assignment.csv").toString());
        robot.clickOn("#assign");
        WaitForAsyncUtils.waitForFxEvents();
        String balance = label(robot, "#taskConditionCounts");
        // 6 candidates per level at 1:1:1: two per condition in each level, four overall
        assertTrue(balance.lines().anyMatch(l -> l.strip().matches("B1 +6 +2 +2 +2")), balance);
        assertTrue(balance.lines().anyMatch(l -> l.strip().matches("all strata +12 +4 +4 +4")), balance);
        assertTrue(balance.contains("allocation ratio achieved: 1.00:1.00:1.00 (stated 1:1:1)"), balance);
        shoot(robot, scene.get(), "admin-forms-parallel.png");
    }

    @Test
    void forms_rosterWithABadRow_namesTheRowAndAssignsNothing(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        setText(robot, "#examFolder", DemoSource.copyExam(dir.resolve("exam-source")).toString());
        robot.clickOn("#checkExam");
        select(robot, 1);
        Path roster = dir.resolve("roster.csv");
        // invented rows; row 3 (the second candidate) has no level
        Files.writeString(roster, "candidate_number,level\nH9001,B1\nH9002,\nH9003,B2\n");
        setText(robot, "#roster", roster.toString());
        setText(robot, "#assignmentOut", dir.resolve("assignment.csv").toString());
        robot.clickOn("#assign");
        WaitForAsyncUtils.waitForFxEvents();
        String result = label(robot, "#formsResult");
        assertTrue(result.contains("roster.csv:3"), result);
        assertTrue(result.contains("level"), result);
        assertFalse(Files.exists(dir.resolve("assignment.csv")), "nothing assigned");
        assertEquals(null, session.assignment().get());
    }

    @Test
    void everyStep_inputsTablesAndButtons_haveAccessibleNames(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        setText(robot, "#examFolder", DemoSource.copyExam(dir.resolve("exam-source")).toString());
        robot.clickOn("#checkExam");
        int count = robot.lookup("#steps").queryListView().getItems().size();
        for (int step = 0; step < count; step++) {
            select(robot, step);
            Node view = robot.lookup("#steps").queryListView().getSelectionModel().getSelectedItem() instanceof Step s
                    ? s.view() : null;
            assertNotNull(view);
            int inputs = 0;
            for (Node n : robot.from(view).lookup((java.util.function.Predicate<Node>) n -> n instanceof TextInputControl
                    || n instanceof TableView || n instanceof javafx.scene.control.ComboBox
                    || n instanceof javafx.scene.control.ChoiceBox || n instanceof javafx.scene.control.CheckBox).queryAll()) {
                // a check box's own text is what a screen reader announces
                boolean named = n.getAccessibleText() != null && !n.getAccessibleText().isBlank()
                        || n instanceof javafx.scene.control.CheckBox c && !c.getText().isBlank();
                assertTrue(named,
                        "step " + (step + 1) + ": " + n + " has no accessible name");
                inputs++;
            }
            assertTrue(inputs > 0, "step " + (step + 1) + " has inputs to check");
            for (javafx.scene.control.Labeled b : robot.from(view).lookup((java.util.function.Predicate<Node>) n -> n instanceof javafx.scene.control.ButtonBase)
                    .<javafx.scene.control.Labeled>queryAll()) {
                assertFalse(b.getText() == null || b.getText().isBlank(), "step " + (step + 1) + ": a button without text");
            }
        }
    }

    @Test
    void bundle_createKeys_showsTheFingerprintsAndNeverOverwrites(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        select(robot, 2);
        Path keys = dir.resolve("new-keys");
        setText(robot, "#keys", keys.toString());
        robot.interact(() -> robot.lookup("#newKeys").queryAs(javafx.scene.control.TitledPane.class).setExpanded(true));
        setText(robot, "#passphrase", new String(PASSPHRASE));
        setText(robot, "#passphraseAgain", new String(PASSPHRASE));
        robot.interact(() -> robot.lookup("#createKeys").queryButton().fire());
        waitForWork(session);
        // the fingerprint on screen is the one the key files hold
        String fingerprint = new OwnerKeyStore(keys).publicKeys().signingFingerprint();
        assertTrue(label(robot, "#keysResult").contains("Signing key (Ed25519) fingerprint " + fingerprint),
                label(robot, "#keysResult"));
        byte[] before = Files.readAllBytes(keys.resolve(OwnerKeyStore.SIGNING_FILE));

        setText(robot, "#passphrase", new String(PASSPHRASE));
        setText(robot, "#passphraseAgain", new String(PASSPHRASE));
        robot.interact(() -> robot.lookup("#createKeys").queryButton().fire());
        waitForWork(session);
        assertTrue(label(robot, "#keysResult").startsWith("No keys were created."), label(robot, "#keysResult"));
        assertTrue(label(robot, "#keysResult").contains("keys already exist"), label(robot, "#keysResult"));
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(keys.resolve(OwnerKeyStore.SIGNING_FILE))));
    }

    private static void writeSimulatedPackages(Path keys, Path bundleFile, Path out) throws Exception {
        OwnerKeyStore.PublicKeys owner = new OwnerKeyStore(keys).publicKeys();
        KeyPair installation = Ed25519.generate();
        Files.createDirectories(out);
        try (OpenedBundle b = ownerReader(keys).open(bundleFile)) {
            SimulatedSitting sitting = new SimulatedSitting(b.manifest(), b.manifestSha256(), installation.getPrivate(),
                    X25519.publicFromRaw(Base64.getDecoder().decode(owner.encryption())));
            long seed = 1;
            for (RosterEntry r : b.manifest().roster()) {
                if (!r.candidateNumber().equals(LEFT_OUT)) {
                    sitting.write(r.candidateNumber(), r.formId(), seed++, 40, out.resolve(r.candidateNumber() + ".inkresp"));
                }
            }
        }
    }

    private static void writeSecondPackage(Path keys, Path bundleFile, String candidate, Path out) throws Exception {
        OwnerKeyStore.PublicKeys owner = new OwnerKeyStore(keys).publicKeys();
        try (OpenedBundle b = ownerReader(keys).open(bundleFile)) {
            SimulatedSitting sitting = new SimulatedSitting(b.manifest(), b.manifestSha256(), Ed25519.generate().getPrivate(),
                    X25519.publicFromRaw(Base64.getDecoder().decode(owner.encryption())));
            String form = b.manifest().roster().stream().filter(r -> r.candidateNumber().equals(candidate)).findFirst()
                    .orElseThrow().formId();
            sitting.write(candidate, form, 9_999, 40, out);
        }
    }

    private static BundleReader ownerReader(Path keys) throws Exception {
        return new BundleReader(TrustPolicy.trusting(Set.of(new OwnerKeyStore(keys).publicKeys().signingFingerprint())));
    }

    private static void fillSecrets(FxRobot robot) {
        setText(robot, "#passphrase", new String(PASSPHRASE));
        setText(robot, "#pin", "invented-pin-8642");
        setText(robot, "#pinAgain", "invented-pin-8642");
    }

    /** Pictures show a step's results: scroll it to its end. */
    private static void scrollToEnd(FxRobot robot) {
        robot.interact(() -> robot.lookup(".step-scroll").queryAs(javafx.scene.control.ScrollPane.class).setVvalue(1.0));
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static void select(FxRobot robot, int step) {
        robot.interact(() -> robot.lookup("#steps").queryListView().getSelectionModel().select(step));
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static void setText(FxRobot robot, String query, String text) {
        robot.interact(() -> robot.lookup(query).queryAs(TextInputControl.class).setText(text));
    }

    private static String label(FxRobot robot, String query) {
        Node node = robot.lookup(query).query();
        assertNotNull(node, query);
        return ((Label) node).getText();
    }

    private static void waitForWork(AdminSession session) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(90, TimeUnit.SECONDS, () -> !session.work().busy().get());
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static int lineOf(String text, String needle) {
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains(needle)) {
                return i + 1;
            }
        }
        throw new AssertionError(needle + " not planted");
    }

    /** The window at 1024x768, the smallest screen the guides promise, saved for docs/screenshots. */
    private static void shoot(FxRobot robot, Scene scene, String name) throws Exception {
        StepDriver.shoot1024(robot, (javafx.stage.Stage) scene.getWindow(), name);
    }
}
