package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collection;
import java.util.List;
import java.util.Map;
import javafx.scene.control.ContextMenu;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.inkgate.format.response.EventType;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Underlines and suggestions as the spelling mode allows, with a stand-in checker that flags
 * "ferie" (suggesting "ferry", "fairy") so the test needs no LanguageTool start-up.
 */
@ExtendWith(ApplicationExtension.class)
class SpellingMarksUiTest {

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

    private void open(FxRobot robot, SpellingMode mode, String start) throws Exception {
        ResourcePolicy policy = new ResourcePolicy(mode, null, null, false, true, PastePolicy.NONE);
        TaskTools tools = TestTools.toolsFor(policy, new TestTools.CountingFactory(TestTools.realPacks(),
                (m, words) -> new ScriptedChecker(m, Map.of("ferie", List.of("ferry", "fairy")))));
        workspace = Shown.show(robot, stage, TestTools.context(tools, log, start, DisplaySettings.standard()), new FakeClipboard(null));
    }

    private Collection<String> styleAt(int offset) {
        return workspace.area().getStyleAtPosition(offset + 1);
    }

    private static ContextMenu showingMenu() {
        return Window.getWindows().stream().filter(w -> w instanceof ContextMenu && w.isShowing())
                .map(w -> (ContextMenu) w).findFirst().orElse(null);
    }

    @Test
    void suggestionsMode_underlinesAndTheMenuReplacesTheWord(FxRobot robot) throws Exception {
        open(robot, SpellingMode.SUGGESTIONS, "The ferie was late.");
        Shown.until("the flag on \"ferie\"", () -> workspace.marks().get().flags().all().size() == 1);
        assertEquals(List.of(SpellingMarks.SPELLING_STYLE), List.copyOf(styleAt(4)), "the word is underlined");
        assertEquals(List.of(), List.copyOf(styleAt(0)), "other words are not");
        assertTrue(log.events(EventType.CHECK_RUN).size() >= 1);

        // typing before the word moves its underline with it
        Shown.onFx(robot, () -> workspace.area().moveTo(0));
        robot.write("Oh. ");
        assertEquals(List.of(SpellingMarks.SPELLING_STYLE), List.copyOf(styleAt(8)));
        assertEquals(8, workspace.marks().get().flags().all().get(0).start());

        // keyboard route to the suggestions: caret in the word, Shift+F10
        Shown.onFx(robot, () -> workspace.area().moveTo(10));
        robot.press(KeyCode.SHIFT, KeyCode.F10).release(KeyCode.F10, KeyCode.SHIFT);
        Shown.until("the suggestion menu", () -> showingMenu() != null);
        RecordingLog.Event shown = log.events(EventType.SUGGESTION_SHOW).get(0);
        assertEquals("ferie", shown.get("word"));
        assertEquals("ferry | fairy", shown.get("suggestions"));
        robot.clickOn("ferry");
        assertEquals("Oh. The ferry was late.", workspace.text());
        RecordingLog.Event accepted = log.events(EventType.SUGGESTION_ACCEPT).get(0);
        assertEquals(Map.of("tool", "spelling", "rule", "SCRIPTED_SPELLING", "pos", 8, "from", "ferie", "to", "ferry"), accepted.data());
        assertTrue(log.events(EventType.TEXT_INSERT).stream().anyMatch(e -> "suggestion".equals(e.get("source")) && "ferry".equals(e.get("text"))));
        assertEquals(workspace.text(), LogReplay.replay("The ferie was late.", log.events()));
        assertEquals(1, workspace.toolUse().get(Tool.SPELLING).suggestionsShown());
        assertEquals(1, workspace.toolUse().get(Tool.SPELLING).suggestionsAccepted());
        Shown.until("the underline gone", () -> styleAt(9).isEmpty());
    }

    @Test
    void suggestionsMode_ignoreRemovesEveryFlagOfThatWord(FxRobot robot) throws Exception {
        open(robot, SpellingMode.SUGGESTIONS, "ferie and ferie");
        Shown.until("two flags", () -> workspace.marks().get().flags().all().size() == 2);
        Shown.onFx(robot, () -> workspace.area().moveTo(2));
        robot.press(KeyCode.SHIFT, KeyCode.F10).release(KeyCode.F10, KeyCode.SHIFT);
        Shown.until("the suggestion menu", () -> showingMenu() != null);
        robot.clickOn("Ignore this word in this task");
        assertEquals(0, workspace.marks().get().flags().all().size());
        assertEquals(Map.of("tool", "spelling", "rule", "SCRIPTED_SPELLING", "word", "ferie"),
                log.events(EventType.SUGGESTION_IGNORE).get(0).data());
        assertEquals(1, workspace.toolUse().get(Tool.SPELLING).suggestionsIgnored());
        assertTrue(styleAt(0).isEmpty() && styleAt(11).isEmpty());
    }

    @Test
    void underlineOnly_underlinesButOffersNoMenuNoListAndNoPanel(FxRobot robot) throws Exception {
        open(robot, SpellingMode.UNDERLINE_ONLY, "The ferie was late.");
        Shown.until("the flag", () -> workspace.marks().get().flags().all().size() == 1);
        assertEquals(List.of(SpellingMarks.SPELLING_STYLE), List.copyOf(styleAt(4)));
        assertTrue(workspace.marks().get().flags().all().get(0).suggestions().isEmpty());
        Shown.onFx(robot, () -> workspace.area().moveTo(6));
        robot.press(KeyCode.SHIFT, KeyCode.F10).release(KeyCode.F10, KeyCode.SHIFT);
        robot.rightClickOn("#answer");
        assertEquals(null, showingMenu(), "no menu at all");
        assertTrue(log.events(EventType.SUGGESTION_SHOW).isEmpty());
        assertTrue(robot.lookup("#resourcePanel").tryQuery().isEmpty(), "underline-only alone offers nothing for a panel");
        assertEquals("The ferie was late.", workspace.text(), "Shift+F10 typed nothing");
    }

    @Test
    void off_buildsNoCheckerAndMarksNothing(FxRobot robot) throws Exception {
        open(robot, SpellingMode.OFF, "The ferie was late.");
        assertTrue(workspace.marks().isEmpty());
        assertTrue(styleAt(4).isEmpty());
        assertTrue(log.events(EventType.CHECK_RUN).isEmpty());
        assertFalse(workspace.toolUse().containsKey(Tool.SPELLING));
    }
}
