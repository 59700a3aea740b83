package org.inkgate.client.practice.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.inkgate.client.practice.PracticeLoader;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.client.testutil.LiveBundles;
import org.inkgate.client.testutil.Tampering;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

@ExtendWith(ApplicationExtension.class)
class PracticeWindowRefusalTest {

    static final String PROMPT_ENTRY = "prompts/task-1-neighbour-note.md";

    @TempDir
    Path temp;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void show_tamperedPromptEntry_showsRefusalNamingEntryAndNoExamContent(FxRobot robot) throws Exception {
        Path tampered = temp.resolve("tampered.inkexam");
        Tampering.flipByteInEntry(DemoBundles.buildInto(temp), PROMPT_ENTRY, tampered);

        open(robot, tampered);

        String message = robot.lookup("#refusalMessage").queryAs(Label.class).getText();
        assertTrue(message.startsWith("tampered.inkexam: entry \"" + PROMPT_ENTRY + "\" does not match the digest"),
                message);
        assertEquals(PracticeStage.REFUSED_TITLE, stage.getTitle());
        assertNothingOfTheExamShown(robot);
        assertTrue(robot.lookup("#practiceBanner").tryQuery().isPresent(), "the practice banner stays");
        assertTrue(robot.lookup("#closeButton").query().isFocused(), "focus starts on Close");
    }

    @Test
    void show_liveSittingBundle_isRefusedInPracticeMode(FxRobot robot) throws Exception {
        open(robot, LiveBundles.buildInto(temp));

        String message = robot.lookup("#refusalMessage").queryAs(Label.class).getText();
        assertTrue(message.contains("this bundle is for a live sitting, not for practice"), message);
        assertNothingOfTheExamShown(robot);
    }

    private void open(FxRobot robot, Path bundle) {
        robot.interact(() -> PracticeStage.show(stage, new PracticeLoader().load(bundle)));
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static void assertNothingOfTheExamShown(FxRobot robot) {
        for (String id : new String[] {"#taskList", "#examTitle", "#formChooser", "#promptText", "#editor"}) {
            assertTrue(robot.lookup(id).tryQuery().isEmpty(), id + " must not be shown for a refused bundle");
        }
        assertTrue(robot.lookup(".task-cell").queryAll().isEmpty(), "no task is listed");
    }
}
