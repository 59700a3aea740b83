package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import javafx.scene.input.InputMethodEvent;
import javafx.scene.input.InputMethodHighlight;
import javafx.scene.input.InputMethodTextRun;
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
 * The editor driven by the robot: every change is logged so the log alone rebuilds the text;
 * undo and redo are logged as such; paste obeys the policy; a frozen workspace changes nothing.
 */
@ExtendWith(ApplicationExtension.class)
class WorkspaceEditingTest {

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

    private WritingWorkspace open(FxRobot robot, PastePolicy paste, FakeClipboard clipboard, String start) throws Exception {
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.OFF, null, null, false, true, paste);
        TaskTools tools = TestTools.toolsFor(policy, TestTools.realPacks());
        workspace = Shown.show(robot, stage, TestTools.context(tools, log, start, DisplaySettings.standard()), clipboard);
        return workspace;
    }

    private String replayed(String start) {
        return LogReplay.replay(start, log.events());
    }

    @Test
    void typing_andDeleting_logsChangesThatReplayToTheText(FxRobot robot) throws Exception {
        open(robot, PastePolicy.NONE, new FakeClipboard(null), "");
        robot.write("The ferry is late");
        robot.type(KeyCode.BACK_SPACE, 4);
        robot.write("early.");
        assertEquals("The ferry is early.", workspace.text());
        assertEquals(replayed(""), workspace.text());
        assertTrue(log.events(EventType.TEXT_INSERT).stream().allMatch(e -> "typing".equals(e.get("source"))));
        assertEquals(4, log.events(EventType.TEXT_DELETE).size(), "each backspace is one delete");
        assertEquals(4, workspace.wordCount());
        assertEquals("4 words", robot.lookup("#wordCount").queryLabeled().getText());
        assertEquals("The ferry is early.", log.snapshots().get(log.snapshots().size() - 1).text(), "the newest text is offered as a snapshot");
    }

    @Test
    void startText_isNotLoggedAsTypingAndTheCaretGoesWhereAsked(FxRobot robot) throws Exception {
        open(robot, PastePolicy.NONE, new FakeClipboard(null), "Recovered words");
        assertEquals(List.of(), log.events(EventType.TEXT_INSERT));
        assertEquals("Recovered words".length(), workspace.caret());
        robot.write(" and more");
        assertEquals("Recovered words and more", replayed("Recovered words"));
    }

    @Test
    void undoAndRedo_areLoggedWithTheirSource(FxRobot robot) throws Exception {
        open(robot, PastePolicy.NONE, new FakeClipboard(null), "");
        robot.write("calm sea");
        robot.press(KeyCode.CONTROL, KeyCode.Z).release(KeyCode.Z, KeyCode.CONTROL);
        assertEquals("", workspace.text(), "undo takes back the typing");
        List<RecordingLog.Event> undone = log.events(EventType.TEXT_DELETE);
        assertFalse(undone.isEmpty());
        assertTrue(undone.stream().allMatch(e -> "undo".equals(e.get("source"))), undone.toString());
        robot.press(KeyCode.CONTROL, KeyCode.Y).release(KeyCode.Y, KeyCode.CONTROL);
        assertEquals("calm sea", workspace.text());
        RecordingLog.Event last = log.events(EventType.TEXT_INSERT).get(log.events(EventType.TEXT_INSERT).size() - 1);
        assertEquals("redo", last.get("source"));
        assertEquals(workspace.text(), replayed(""));
    }

    @Test
    void paste_fromOutsideTheResponse_isRefusedAndLogged(FxRobot robot) throws Exception {
        FakeClipboard clipboard = new FakeClipboard("text from another program");
        open(robot, PastePolicy.WITHIN_RESPONSE, clipboard, "My answer.");
        robot.press(KeyCode.CONTROL, KeyCode.V).release(KeyCode.V, KeyCode.CONTROL);
        assertEquals("My answer.", workspace.text());
        RecordingLog.Event refused = log.events(EventType.PASTE_REFUSED).get(0);
        assertEquals(Map.of("reason", "outside-clipboard", "len", "text from another program".length()), refused.data());
        assertEquals("Only text copied from your own answer can be pasted here.", robot.lookup("#checkStatus").queryLabeled().getText());
    }

    @Test
    void paste_ofTextCopiedInTheSameAnswer_isInsertedAsPaste(FxRobot robot) throws Exception {
        FakeClipboard clipboard = new FakeClipboard(null);
        open(robot, PastePolicy.WITHIN_RESPONSE, clipboard, "harbour ");
        Shown.onFx(robot, () -> workspace.area().selectRange(0, 7));
        robot.press(KeyCode.CONTROL, KeyCode.C).release(KeyCode.C, KeyCode.CONTROL);
        Shown.onFx(robot, () -> workspace.area().moveTo(8));
        robot.press(KeyCode.CONTROL, KeyCode.V).release(KeyCode.V, KeyCode.CONTROL);
        assertEquals("harbour harbour", workspace.text());
        RecordingLog.Event pasted = log.events(EventType.TEXT_INSERT).get(0);
        assertEquals("paste", pasted.get("source"));
        // another program replaces the clipboard: that text is refused
        clipboard.fromOutside("harbour!");
        robot.press(KeyCode.CONTROL, KeyCode.V).release(KeyCode.V, KeyCode.CONTROL);
        assertEquals("harbour harbour", workspace.text());
        assertEquals("outside-clipboard", log.events(EventType.PASTE_REFUSED).get(0).get("reason"));
    }

    @Test
    void paste_whenThePolicyForbidsIt_isRefusedEvenForOwnText(FxRobot robot) throws Exception {
        FakeClipboard clipboard = new FakeClipboard(null);
        open(robot, PastePolicy.NONE, clipboard, "quay");
        Shown.onFx(robot, () -> workspace.area().selectAll());
        robot.press(KeyCode.CONTROL, KeyCode.C).release(KeyCode.C, KeyCode.CONTROL);
        assertEquals(null, clipboard.readText(), "copy puts nothing on the clipboard when paste is forbidden");
        robot.press(KeyCode.CONTROL, KeyCode.X).release(KeyCode.X, KeyCode.CONTROL);
        assertEquals("quay", workspace.text(), "cut does nothing when paste is forbidden");
        Shown.onFx(robot, () -> workspace.area().moveTo(4));
        clipboard.fromOutside("quay");
        robot.press(KeyCode.CONTROL, KeyCode.V).release(KeyCode.V, KeyCode.CONTROL);
        assertEquals("quay", workspace.text());
        assertEquals("paste-forbidden", log.events(EventType.PASTE_REFUSED).get(0).get("reason"));
        assertEquals("Pasting is not allowed in this task.", robot.lookup("#checkStatus").queryLabeled().getText());
    }

    @Test
    void setFrozen_blocksTypingPasteAndUndoUntilUnfrozen(FxRobot robot) throws Exception {
        FakeClipboard clipboard = new FakeClipboard(null);
        open(robot, PastePolicy.WITHIN_RESPONSE, clipboard, "");
        robot.write("one");
        Shown.onFx(robot, () -> workspace.setFrozen(true));
        robot.write(" two");
        robot.press(KeyCode.CONTROL, KeyCode.Z).release(KeyCode.Z, KeyCode.CONTROL);
        robot.type(KeyCode.BACK_SPACE);
        assertEquals("one", workspace.text());
        Shown.onFx(robot, () -> {
            workspace.setFrozen(false);
            workspace.focusEditor();
        });
        robot.write(" three");
        assertEquals("one three", workspace.text());
        assertEquals(workspace.text(), replayed(""));
    }

    @Test
    void setFrozen_panelAnswersNothingAndInsertIsIgnored(FxRobot robot) throws Exception {
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.OFF, TestTools.GLOSSARY, null, true, true, PastePolicy.NONE);
        workspace = Shown.show(robot, stage, TestTools.context(TestTools.toolsFor(policy, TestTools.realPacks()), log, "Text.",
                DisplaySettings.standard()), new FakeClipboard(null));
        Shown.onFx(robot, () -> workspace.setFrozen(true));
        assertTrue(robot.lookup("#resourcePanel").query().isDisabled());
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.G).release(KeyCode.G, KeyCode.SHIFT, KeyCode.CONTROL);
        assertTrue(workspace.area().isFocused(), "the glossary shortcut does nothing while frozen");
        Shown.onFx(robot, () -> workspace.insert(org.inkgate.packs.policy.Tool.GLOSSARY, "f001", "ferry"));
        assertEquals("Text.", workspace.text());
        assertTrue(log.events(EventType.TOOL_INSERT).isEmpty());
        assertTrue(log.events(EventType.TOOL_QUERY).isEmpty());
    }

    @Test
    void close_releasesTheToolsAndLogsThePanelClosed(FxRobot robot) throws Exception {
        ScriptedChecker[] made = new ScriptedChecker[1];
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.SUGGESTIONS, TestTools.GLOSSARY, null, false, true, PastePolicy.NONE);
        TaskTools tools = TestTools.toolsFor(policy, new TestTools.CountingFactory(TestTools.realPacks(), (m, words) -> {
            made[0] = new ScriptedChecker(m, Map.of());
            return made[0];
        }));
        WritingWorkspace w = Shown.show(robot, stage, TestTools.context(tools, log, "", DisplaySettings.standard()), new FakeClipboard(null));
        robot.clickOn("#glossaryQuery"); // the candidate is in the panel when the task ends
        robot.interact(w::close);
        assertTrue(made[0].closed, "the checker's thread is stopped");
        assertEquals(List.of("glossary"), log.events(EventType.PANEL_CLOSE).stream().map(e -> e.get("tool")).toList());
        robot.interact(w::close); // a second close changes nothing
        assertEquals(1, log.events(EventType.PANEL_CLOSE).size());
    }

    @Test
    void inputMethod_committedTextGoesInAndIsLoggedAsTyping(FxRobot robot) throws Exception {
        open(robot, PastePolicy.NONE, new FakeClipboard(null), "");
        boolean[] registered = {true};
        Shown.onFx(robot, () -> {
            if (javafx.application.Platform.isSupported(javafx.application.ConditionalFeature.INPUT_METHOD)) {
                // where the platform has input methods, RichTextFX must have registered for them (Monocle headless has none)
                registered[0] = workspace.area().getInputMethodRequests() != null && workspace.area().getOnInputMethodTextChanged() != null;
            }
        });
        assertTrue(registered[0], "the editor takes input-method events where the platform has them");
        // a composition in progress, then its commit, as an input method for Japanese sends them
        Shown.onFx(robot, () -> {
            workspace.area().inputMethodEvent(new InputMethodEvent(InputMethodEvent.INPUT_METHOD_TEXT_CHANGED,
                    List.of(new InputMethodTextRun("\u306F\u3057", InputMethodHighlight.UNSELECTED_RAW)), "", 2));
            workspace.area().inputMethodEvent(new InputMethodEvent(InputMethodEvent.INPUT_METHOD_TEXT_CHANGED,
                    List.of(), "\u6A4B", 0));
        });
        assertEquals("\u6A4B", workspace.text());
        assertEquals(workspace.text(), replayed(""));
        assertEquals("typing", log.events(EventType.TEXT_INSERT).get(log.events(EventType.TEXT_INSERT).size() - 1).get("source"));
    }

    @Test
    void controlCharacters_fromAnInputMethodNeverReachTheAnswer(FxRobot robot) throws Exception {
        // collect refuses a package whose text holds U+0000 (PackageContentRules: a PostgreSQL store
        // cannot hold it; XML 1.0, section 2.2 "Characters", forbids it and the other C0 controls but
        // tab, line feed and carriage return), so the editor must never let one in: an input method
        // is the one way past the key handling, which drops control characters itself
        open(robot, PastePolicy.NONE, new FakeClipboard(null), "");
        Shown.onFx(robot, () -> workspace.area().inputMethodEvent(new InputMethodEvent(
                InputMethodEvent.INPUT_METHOD_TEXT_CHANGED, List.of(), "ferry\u0000 \u0001port\u001B\ttime\n", 0)));
        assertEquals("ferry port\ttime\n", workspace.text());
        assertEquals(workspace.text(), replayed(""), "the log holds what the answer holds");
    }

    @Test
    void tab_staysInTheAnswerAndCtrlTabLeavesIt(FxRobot robot) throws Exception {
        open(robot, PastePolicy.NONE, new FakeClipboard(null), "");
        robot.press(KeyCode.CONTROL, KeyCode.TAB).release(KeyCode.TAB, KeyCode.CONTROL);
        assertFalse(workspace.area().isFocused(), "Ctrl+Tab moves focus out of the answer (no keyboard trap)");
    }
}
