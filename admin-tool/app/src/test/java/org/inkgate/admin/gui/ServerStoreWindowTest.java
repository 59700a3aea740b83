package org.inkgate.admin.gui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Labeled;
import javafx.scene.control.ListView;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import picocli.CommandLine;

/**
 * Issue 19: the admin window on a PostgreSQL store, as on a store file. A test owner types the
 * server's address into the store field and chooses a password file; collect, missing responses,
 * rating administration, the rating desk and the export then work on the server through the same
 * core calls as the command line, and give what the command line gives on the same store. A
 * wrong password or an unreachable server gives the command's message on screen, keeps what was
 * typed and changes nothing. The server is the tests' own (PostgresServer); the password is
 * invented and must appear nowhere on screen.
 */
@ExtendWith(ApplicationExtension.class)
class ServerStoreWindowTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv");
    /** An invented password; nothing on screen may show it. */
    private static final String PASSWORD = "Invented-Window-Pass-19";

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @AfterEach
    void closeDesks(FxRobot robot) {
        robot.interact(() -> Window.getWindows().stream().filter(w -> w != stage && w instanceof Stage).toList()
                .forEach(w -> ((Stage) w).close()));
    }

    @Test
    void collectMissingRatingDeskExport_onAPostgresqlStoreWithAPasswordFile_workAsTheCommandsDo(FxRobot robot)
            throws Exception {
        Sitting sitting = sitting("winall");
        Path passwords = Files.writeString(dir.resolve("store.pgpass"), "localhost:" + sitting.database.port() + ":"
                + sitting.database.database() + ":" + sitting.role + ":" + PASSWORD + "\n");
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));

        collect(robot, session, sitting, passwords);
        assertTrue(StepDriver.label(robot, "#collectCounts").startsWith("Imported 11,"),
                StepDriver.label(robot, "#collectCounts"));

        StepDriver.scrollTo(robot, "#storeFile", 20);
        StepDriver.shoot1024(robot, stage, "admin-collect-server-store.png");

        // the next steps show the same server store and password file without retyping
        StepDriver.select(robot, "Missing responses");
        assertEquals(sitting.url, text(robot, "#missingStore"));
        assertEquals(passwords.toString(), text(robot, "#missingStorePasswordFile"));
        StepDriver.press(robot, "#showMissing");
        String missing = StepDriver.label(robot, "#missingReport");
        assertTrue(missing.contains("candidate H1012"), missing);

        StepDriver.select(robot, "Rating administration");
        assertEquals(sitting.url, text(robot, "#ratingStore"));
        for (String rater : List.of("R1", "R2")) {
            StepDriver.setText(robot, "#raterId", rater);
            StepDriver.setText(robot, "#raterCapacity", "");
            StepDriver.press(robot, "#addRater");
            StepDriver.waitForWork(session);
        }
        StepDriver.setText(robot, "#ratingSeed", "4242");
        StepDriver.press(robot, "#assignRatings");
        StepDriver.waitForWork(session);
        String assigned = StepDriver.label(robot, "#ratingMessage");
        // 11 packages of the demo's 2 tasks each (src/demo): 22 responses
        assertTrue(assigned.contains("Assigned 22 responses to 2 rater(s) each, seed 4242"), assigned);
        String examId;
        try (var results = Stores.openResultsForReading(sitting.database)) {
            examId = results.examIds().get(0);
        }

        // the desk opens over the server store and a rater's submission lands there
        StepDriver.select(robot, "Rating desk");
        assertEquals(sitting.url, text(robot, "#deskStore"));
        robot.interact(() -> robot.lookup("#openDesk").queryButton().fire());
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> desk() != null);
        Stage desk = desk();
        ListView<?> raters = robot.from(desk.getScene().getRoot()).lookup("#raters").queryListView();
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> !raters.getItems().isEmpty());
        robot.interact(() -> {
            raters.getSelectionModel().select(0);
            raters.requestFocus();
        });
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> robot.lookup("#score-task-fulfilment").tryQuery()
                .isPresent());
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("#score-task-fulfilment").write("6").type(KeyCode.ENTER).write("5");
        robot.press(KeyCode.CONTROL).type(KeyCode.ENTER).release(KeyCode.CONTROL);
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> rated(sitting.database, examId) == 1);
        robot.interact(desk::close);

        StepDriver.select(robot, "Exports");
        assertEquals(sitting.url, text(robot, "#exportStore"));
        Path fromWindow = dir.resolve("export-window");
        StepDriver.setText(robot, "#exportFolder", fromWindow.toString());
        StepDriver.press(robot, "#export");
        StepDriver.waitForWork(session);
        Path fromCommand = dir.resolve("export-command");
        String[] printed = admin("export", "--store", sitting.url, "--store-password-file", passwords.toString(),
                "--out", fromCommand.toString());
        assertEquals("0", printed[0], printed[1]);
        List<Path> csv = csvFiles(fromCommand);
        assertFalse(csv.isEmpty(), printed[1]);
        assertEquals(csv.stream().map(p -> fromCommand.relativize(p).toString()).toList(),
                csvFiles(fromWindow).stream().map(p -> fromWindow.relativize(p).toString()).toList(),
                StepDriver.label(robot, "#exportWritten"));
        for (Path p : csv) {
            assertArrayEquals(Files.readAllBytes(p), Files.readAllBytes(fromWindow.resolve(fromCommand.relativize(p))),
                    "the window's export of " + fromCommand.relativize(p) + " is the command's, byte for byte");
        }
        assertNoPasswordOnScreen(robot);
    }

    @Test
    void wrongPasswordFileOrNoServer_theCommandsMessageOnScreen_whatWasTypedKeptAndNothingImported(FxRobot robot)
            throws Exception {
        Sitting sitting = sitting("winwrong");
        Path wrong = Files.writeString(dir.resolve("wrong.pgpass"), "*:*:*:" + sitting.role + ":Not-" + PASSWORD + "\n");
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));

        collect(robot, session, sitting, wrong);
        String said = StepDriver.label(robot, "#collectCounts");
        String[] command = admin("missing", "--store", sitting.url, "--store-password-file", wrong.toString());
        String commandSays = command[1].strip().replaceFirst("^inkgate-admin missing: ", "").lines().findFirst()
                .orElseThrow();
        assertTrue(commandSays.contains("the PostgreSQL server refused the login of " + sitting.role), command[1]);
        assertTrue(commandSays.contains("wrong password or no access"), command[1]);
        assertTrue(said.contains(commandSays), "the window says what the command says: " + said + "\n" + commandSays);
        // what was typed stays, so the test owner fixes the password file and collects again
        assertEquals(sitting.url, text(robot, "#storeFile"));
        assertEquals(wrong.toString(), text(robot, "#storeFilePasswordFile"));
        // the refused login created nothing: the database still holds none of the store's tables
        StoreException none = assertThrows(StoreException.class, () -> Stores.openResultsForReading(sitting.database));
        assertTrue(none.getMessage().contains("holds none of its tables"), none.getMessage());

        StepDriver.select(robot, "Missing responses");
        StepDriver.press(robot, "#showMissing");
        String missing = StepDriver.label(robot, "#missingReport");
        assertTrue(missing.contains(commandSays), missing);

        // rating administration: the command's words, and no rater added
        StepDriver.select(robot, "Rating administration");
        StepDriver.setText(robot, "#raterId", "R1");
        StepDriver.press(robot, "#addRater");
        StepDriver.waitForWork(session);
        String[] rate = admin("rate", "raters", "add", "R1", "--store", sitting.url, "--store-password-file",
                wrong.toString());
        String rateSays = rate[1].strip().replaceFirst("^inkgate-admin[^:]*: ", "").lines().findFirst().orElseThrow();
        assertTrue(rateSays.contains("wrong password or no access"), rate[1]);
        assertEquals("Refused, nothing changed: " + rateSays, StepDriver.label(robot, "#ratingMessage"));

        // no server listening: the command's words again
        String nowhere = "postgresql://" + sitting.role + "@127.0.0.1:1/nowhere?sslmode=disable&connectTimeout=2";
        StepDriver.select(robot, "Missing responses");
        StepDriver.setText(robot, "#missingStore", nowhere);
        StepDriver.press(robot, "#showMissing");
        String[] unreachable = admin("missing", "--store", nowhere, "--store-password-file", wrong.toString());
        String unreachableSays = unreachable[1].strip().replaceFirst("^inkgate-admin missing: ", "").lines()
                .findFirst().orElseThrow();
        assertTrue(StepDriver.label(robot, "#missingReport").contains(unreachableSays),
                StepDriver.label(robot, "#missingReport") + "\n" + unreachableSays);

        // the right password file: the same collect now imports everything
        Path right = Files.writeString(dir.resolve("right.pgpass"), "*:*:*:" + sitting.role + ":" + PASSWORD + "\n");
        collect(robot, session, sitting, right);
        assertTrue(StepDriver.label(robot, "#collectCounts").startsWith("Imported 11,"),
                StepDriver.label(robot, "#collectCounts"));

        // a store a newer inkgate-admin wrote (its schema version raised by hand): refused in the command's words
        try (var c = java.sql.DriverManager.getConnection(PostgresServer.shared().getJdbcUrl("postgres",
                sitting.database.database())); var st = c.createStatement()) {
            st.execute("INSERT INTO inkgate_schema_version(version) VALUES (999)");
        }
        StepDriver.select(robot, "Missing responses");
        assertEquals(sitting.url, text(robot, "#missingStore"));
        StepDriver.press(robot, "#showMissing");
        String[] newer = admin("missing", "--store", sitting.url, "--store-password-file", right.toString());
        String newerSays = newer[1].strip().replaceFirst("^inkgate-admin missing: ", "").lines().findFirst()
                .orElseThrow();
        assertTrue(newerSays.contains("schema version 999"), newer[1]);
        assertTrue(StepDriver.label(robot, "#missingReport").contains(newerSays),
                StepDriver.label(robot, "#missingReport") + "\n" + newerSays);
        assertNoPasswordOnScreen(robot);
    }

    /** A sitting's packages and an empty server database with a password role. */
    private record Sitting(Path bundle, Path keys, Path packages, StoreLocation.Server database, String role,
            String url) {
    }

    private Sitting sitting(String name) throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261203, dir);
        Path keys = dir.resolve("keys");
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(keys, bundle, packages, "H1012");
        StoreLocation.Server database = PostgresServer.freshStore(name);
        String role = name + "_owner";
        PostgresServer.passwordRole(role, PASSWORD, database.database());
        return new Sitting(bundle, keys, packages, database, role, "postgresql://" + role + "@localhost:"
                + database.port() + "/" + database.database() + "?sslmode=disable");
    }

    /** Step 4 as a test owner fills it in, with the server's address and a password file. */
    private static void collect(FxRobot robot, AdminSession session, Sitting sitting, Path passwordFile)
            throws Exception {
        if (session.exam().get() == null) {
            // step 1, so that collect records the rubric the rating steps need
            StepDriver.select(robot, "Exam check");
            StepDriver.setText(robot, "#examFolder", EXAM.toAbsolutePath().toString());
            robot.clickOn("#checkExam");
            WaitForAsyncUtils.waitForFxEvents();
            StepDriver.waitForWork(session);
            assertTrue(StepDriver.label(robot, "#examSummary").startsWith("No problems found"),
                    StepDriver.label(robot, "#examSummary"));
        }
        StepDriver.select(robot, "Collect");
        StepDriver.setText(robot, "#packageFolders", sitting.packages.toString());
        StepDriver.setText(robot, "#collectBundle", sitting.bundle.toString());
        StepDriver.setText(robot, "#collectKeys", sitting.keys.toString());
        StepDriver.setText(robot, "#storeFile", sitting.url);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("#storeFilePasswordFile").query().isVisible(), "a server store asks for its password");
        StepDriver.setText(robot, "#storeFilePasswordFile", passwordFile.toString());
        robot.interact(() -> robot.lookup("#anyInstallation").queryAs(CheckBox.class).setSelected(true));
        StepDriver.setText(robot, "#collectPassphrase", CommandLineSitting.passphrase());
        StepDriver.press(robot, "#collect");
        StepDriver.waitForWork(session);
    }

    private static int rated(StoreLocation.Server database, String examId) throws Exception {
        try (RatingStore s = Stores.openRating(database, examId)) {
            return s.progressRows().stream().mapToInt(RatingStore.ProgressRow::rated).sum();
        }
    }

    private void assertNoPasswordOnScreen(FxRobot robot) {
        WaitForAsyncUtils.waitForFxEvents();
        for (Node n : robot.from(stage.getScene().getRoot()).lookup((java.util.function.Predicate<Node>) n -> true).queryAll()) {
            String shown = n instanceof Labeled l ? l.getText() : n instanceof TextInputControl t ? t.getText() : null;
            assertFalse(shown != null && shown.contains(PASSWORD), "the password is shown in " + n);
        }
    }

    private static String text(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(TextInputControl.class).getText();
    }

    private static Stage desk() {
        return Window.getWindows().stream().filter(w -> w instanceof Stage s && "Inkgate rating desk".equals(s.getTitle()))
                .map(Stage.class::cast).findFirst().orElse(null);
    }

    /** {exit code, standard output and error} of the real command line. */
    private static String[] admin(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new String[] {Integer.toString(code), err + "\n" + out};
    }

    private static List<Path> csvFiles(Path folder) throws Exception {
        try (Stream<Path> s = Files.walk(folder)) {
            return s.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
        }
    }
}
