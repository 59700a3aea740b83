package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.format.response.EventType;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Found by the rehearsal (issue 14): "time in the resource panel" equalled time on task, since
 * panel.open was logged when the task opened and moving focus into or out of the panel logged
 * nothing. The candidate is in the panel while keyboard focus is inside it and the window has
 * focus; the real workspace, driven by clicks and keys through the robot, logs exactly those spans.
 */
@ExtendWith(ApplicationExtension.class)
class PanelFocusTest {

    private Stage stage;
    private WritingWorkspace workspace;
    private final RecordingLog log = new RecordingLog();

    @Start
    void start(Stage primary) {
        stage = primary;
    }

    @AfterEach
    void close(FxRobot robot) {
        if (workspace != null) {
            robot.interact(workspace::close);
        }
    }

    @Test
    void panelSpans_followKeyboardFocusInAndOutOfThePanel(FxRobot robot) throws Exception {
        // dictionary and glossary: tabs in that order, the dictionary's page in view first
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.OFF, TestTools.GLOSSARY, TestTools.DICTIONARY, false, true,
                PastePolicy.NONE);
        TaskTools tools = TestTools.toolsFor(policy, TestTools.realPacks());
        workspace = Shown.show(robot, stage, TestTools.context(tools, log, "", DisplaySettings.standard()), new FakeClipboard(null));

        robot.write("The ferry");
        assertEquals(List.of(), spans(), "the panel beside the answer is not in use: nothing logged at task start or while typing");

        robot.clickOn("#dictionaryQuery"); // a click into the panel
        robot.write("ferry");
        robot.type(KeyCode.ESCAPE); // back to the answer
        robot.write(" leaves");
        robot.press(KeyCode.SHORTCUT, KeyCode.SHIFT, KeyCode.G).release(KeyCode.G, KeyCode.SHIFT, KeyCode.SHORTCUT); // a tool's shortcut
        robot.press(KeyCode.SHORTCUT, KeyCode.SHIFT, KeyCode.D).release(KeyCode.D, KeyCode.SHIFT, KeyCode.SHORTCUT); // a switch inside
        robot.type(KeyCode.F6); // back to the answer
        robot.write(" at nine");
        robot.type(KeyCode.F6); // into the panel: the page in view
        // another program takes the window, and gives it back (set as the platform does; Monocle cannot switch windows)
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, false));
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, true));
        robot.interact(workspace::close); // the task ends while the candidate is in the panel

        assertEquals(List.of(
                "panel.open dictionary", "panel.close dictionary",   // click, Esc
                "panel.open glossary", "panel.close glossary",       // shortcut, then the switch ...
                "panel.open dictionary", "panel.close dictionary",   // ... at once; F6 out
                "panel.open dictionary", "panel.close dictionary",   // F6 in; the window loses focus
                "panel.open dictionary", "panel.close dictionary"),  // the window has it back; the task ends
                spans());
        assertEquals("The ferry leaves at nine", workspace.text(), "typing went to the answer, not the panel");
    }

    /** The panel events in order, as "type tool". */
    private List<String> spans() {
        return log.events().stream()
                .filter(e -> e.type().equals(EventType.PANEL_OPEN.wireName()) || e.type().equals(EventType.PANEL_CLOSE.wireName()))
                .map(e -> e.type() + " " + e.get("tool")).toList();
    }
}
