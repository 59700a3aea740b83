package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.RatingStore;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The real desk window in its own process ({@link DeskKillProcess}), killed with SIGKILL
 * (Process.destroyForcibly) while the rater types a comment: the submitted rating, the draft's
 * score and at least every letter the desk reported as kept must be in the store, and the next desk
 * on the same file must open on that response with the draft on screen.
 */
@ExtendWith(ApplicationExtension.class)
class DeskKilledTest {

    private static final String COMMENT = "Clear purpose, but the second request is only hinted at";
    private static final int KILL_AFTER = 12;
    /** The headless JavaFX settings surefire gives this JVM (ui.test.argLine in the parent pom), passed on. */
    private static final List<String> UI_PROPERTIES = List.of("testfx.robot", "testfx.headless", "glass.platform",
            "monocle.platform", "prism.order", "java.awt.headless");

    @TempDir
    Path dir;
    private Stage stage;
    private final List<AutoCloseable> open = new ArrayList<>();

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @AfterEach
    void closeAll(FxRobot robot) throws Exception {
        robot.interact(() -> stage.hide());
        for (AutoCloseable c : open.reversed()) {
            c.close();
        }
    }

    @Test
    void desk_killedWhileTypingAComment_nothingReportedKeptIsLost(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir, List.of("rater-a", "rater-b", "rater-c"));
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED"));
        for (String p : UI_PROPERTIES) {
            if (System.getProperty(p) != null) {
                command.add("-D" + p + "=" + System.getProperty(p));
            }
        }
        command.addAll(List.of("-cp", System.getProperty("java.class.path"), DeskKillProcess.class.getName(),
                rated.file().toString(), rated.exam().examId(), COMMENT));
        Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
        BlockingQueue<String> lines = new LinkedBlockingQueue<>();
        Thread reader = new Thread(() -> {
            try (BufferedReader r = new BufferedReader(new InputStreamReader(process.getInputStream(), StandardCharsets.UTF_8))) {
                for (String line; (line = r.readLine()) != null; ) {
                    lines.add(line);
                }
            } catch (java.io.IOException e) {
                // the process was killed: its output ends
            }
        }, "desk-process-output");
        reader.setDaemon(true);
        reader.start();
        String[] opened = null;
        List<String> seen = new ArrayList<>();
        try {
            for (String line; (line = lines.poll(90, TimeUnit.SECONDS)) != null; ) {
                seen.add(line);
                if (line.startsWith("OPEN ")) {
                    opened = line.split(" ");
                }
                if (line.equals("KEPT " + KILL_AFTER)) {
                    break;
                }
            }
            assertNotNull(opened, "the desk process opened a second response: " + seen);
            assertTrue(seen.contains("KEPT " + KILL_AFTER), "the desk process kept " + KILL_AFTER + " letters: " + seen);
        } finally {
            process.destroyForcibly();
            assertTrue(process.waitFor(30, TimeUnit.SECONDS));
        }
        String rater = opened[1];
        String submitted = opened[2];
        String drafted = opened[3];

        RatingSheet draft;
        try (RatingStore check = rated.open()) {
            assertEquals(Map.of("task-fulfilment", 6, "language-control", 5),
                    check.submitted(rater, submitted).orElseThrow().scores(), "the rating submitted before the kill");
            draft = check.sheet(rater, drafted).orElseThrow();
            assertEquals(Map.of("task-fulfilment", 7), draft.scores(), "the draft's score");
            assertTrue(COMMENT.startsWith(draft.comment()) && draft.comment().length() >= KILL_AFTER,
                    "every letter reported kept is stored, nothing else: '" + draft.comment() + "'");
            assertTrue(check.submitted(rater, drafted).isEmpty(), "a draft is not a rating");
        }

        RatingStore store = rated.open();
        open.add(store);
        DeskModel model = new DeskModel(store);
        open.add(model);
        robot.interact(() -> DeskWindow.show(stage, model));
        DeskShots.settle(model);
        robot.type(KeyCode.ENTER);
        DeskShots.settle(model);
        assertEquals(rater, model.rater().get().id());
        assertEquals(drafted, model.current().get().blindId(), "the new desk opens where the killed one stopped");
        assertEquals("7", robot.lookup("#score-task-fulfilment").queryAs(TextField.class).getText());
        assertEquals(draft.comment(), robot.lookup("#comment").queryAs(TextArea.class).getText());
    }
}
