package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.format.response.EventType;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.CheckIssue;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * A scripted writing session on the real tools (LanguageTool, the WordNet pack, the demo glossary
 * pack), driven by the robot: typing, deleting, accepting a spelling suggestion, looking a word
 * up and inserting it, searching the glossary and inserting a term, undo, copy and paste. The
 * process log alone must rebuild exactly the final text. (LanguageTool flagging "nigth" with
 * "night" among its suggestions is its en-GB speller's behaviour, from memory, not a documented value.)
 */
@ExtendWith(ApplicationExtension.class)
class ScriptedSessionReplayTest {

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
    void scriptedSession_logReplaysToExactlyTheFinalText(FxRobot robot) throws Exception {
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.SUGGESTIONS, TestTools.GLOSSARY, TestTools.DICTIONARY, true, true,
                PastePolicy.WITHIN_RESPONSE);
        TaskTools tools = TestTools.toolsFor(policy, TestTools.realPacks());
        // a precondition, not what is tested: LanguageTool's warm-up takes about 5 s on a quiet machine and
        // took over 60 s in a whole-module run on 2 cores shared at load 20; KeystrokeBench allows 300 s
        tools.spelling().orElseThrow().warmUp().get(180, TimeUnit.SECONDS);
        workspace = Shown.show(robot, stage, TestTools.context(tools, log, "", DisplaySettings.standard()), new FakeClipboard(null));

        // typing, with a misspelling
        robot.write("The harbour is quiet at nigth. ");
        Shown.until("LanguageTool flags \"nigth\"", () -> flag("nigth") != null);
        CheckIssue nigth = flag("nigth");
        assertTrue(nigth.suggestions().contains("night"), "suggestions for nigth: " + nigth.suggestions());

        // deleting: the last ". " goes, then more typing
        robot.type(KeyCode.BACK_SPACE, 2);
        robot.write(" and calm.");

        // accepting a suggestion from the editor's menu
        Shown.onFx(robot, () -> workspace.area().moveTo(nigth.start() + 2));
        robot.press(KeyCode.SHIFT, KeyCode.F10).release(KeyCode.F10, KeyCode.SHIFT);
        robot.clickOn("night");
        assertEquals("The harbour is quiet at night and calm.", workspace.text());

        // looking a word up in the dictionary and inserting a synonym at the end
        Shown.onFx(robot, () -> workspace.area().moveTo(workspace.area().getLength()));
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.D).release(KeyCode.D, KeyCode.SHIFT, KeyCode.CONTROL);
        robot.write("calm").type(KeyCode.ENTER);
        ListView<?> dictionaryResults = robot.lookup("#dictionaryResults").queryListView();
        // the cells come with the next layout pulse, later than the items on a busy machine
        Shown.until("dictionary entries for calm", () -> !dictionaryResults.getItems().isEmpty()
                && robot.lookup("#dictionaryResults .list-cell").tryQuery().isPresent());
        robot.clickOn(robot.lookup("#dictionaryResults .list-cell").nth(0).queryAs(javafx.scene.Node.class));
        ListView<String> words = robot.lookup("#dictionaryInsertable").queryListView();
        Shown.until("the entry's words", () -> !words.getItems().isEmpty());
        Shown.onFx(robot, () -> {
            workspace.focusEditor();
            workspace.area().moveTo(workspace.area().getLength());
        });
        robot.write(" ");
        robot.clickOn(robot.lookup("#dictionaryInsertable .list-cell").nth(0).queryAs(javafx.scene.Node.class));
        String word = words.getSelectionModel().getSelectedItem();
        robot.clickOn("#dictionaryInsert");
        assertTrue(workspace.text().endsWith(" " + word), workspace.text());

        // searching the glossary as you type and inserting a term
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.G).release(KeyCode.G, KeyCode.SHIFT, KeyCode.CONTROL);
        robot.write("gangw");
        ListView<?> glossaryResults = robot.lookup("#glossaryResults").queryListView();
        Shown.until("glossary hits for gangw", () -> !glossaryResults.getItems().isEmpty()
                && robot.lookup("#glossaryResults .list-cell").tryQuery().isPresent());
        robot.clickOn(robot.lookup("#glossaryResults .list-cell").nth(0).queryAs(javafx.scene.Node.class));
        ListView<String> terms = robot.lookup("#glossaryInsertable").queryListView();
        Shown.until("the entry's terms", () -> terms.getItems().contains("gangway"));
        Shown.onFx(robot, () -> {
            workspace.area().moveTo(workspace.area().getLength());
            workspace.area().replaceText(workspace.area().getLength(), workspace.area().getLength(), " ");
            terms.getSelectionModel().select("gangway");
        });
        robot.clickOn("#glossaryInsert");
        assertTrue(workspace.text().endsWith(" gangway"), workspace.text());

        // undo (takes back the insertion), then copy a word and paste it
        robot.press(KeyCode.CONTROL, KeyCode.Z).release(KeyCode.Z, KeyCode.CONTROL);
        assertFalse(workspace.text().endsWith("gangway"));
        Shown.onFx(robot, () -> workspace.area().selectRange(4, 11));
        robot.press(KeyCode.CONTROL, KeyCode.C).release(KeyCode.C, KeyCode.CONTROL);
        Shown.onFx(robot, () -> workspace.area().moveTo(workspace.area().getLength()));
        robot.press(KeyCode.CONTROL, KeyCode.V).release(KeyCode.V, KeyCode.CONTROL);
        assertTrue(workspace.text().endsWith("harbour"), workspace.text());
        robot.write(".");

        // the log alone gives back the text
        assertEquals(workspace.text(), LogReplay.replay("", log.events()));

        Set<String> sources = new TreeSet<>();
        log.events(EventType.TEXT_INSERT).forEach(e -> sources.add((String) e.get("source")));
        log.events(EventType.TEXT_DELETE).forEach(e -> sources.add((String) e.get("source")));
        assertEquals(Set.of("typing", "suggestion", "panel", "undo", "paste"), sources);
        assertEquals(List.of("dictionary", "glossary"), log.events(EventType.TOOL_INSERT).stream().map(e -> (String) e.get("tool")).toList());
        assertTrue(log.events(EventType.TOOL_QUERY).stream().anyMatch(e -> "calm".equals(e.get("query")) && "dictionary".equals(e.get("tool"))));
        assertTrue(log.events(EventType.TOOL_QUERY).stream().anyMatch(e -> "gangw".equals(e.get("query")) && "glossary".equals(e.get("tool"))));
        assertEquals(2, log.events(EventType.TOOL_OPEN).size());
        assertEquals("night", log.events(EventType.SUGGESTION_ACCEPT).get(0).get("to"));
        assertEquals(1, workspace.toolUse().get(Tool.DICTIONARY).insertions());
        assertEquals(1, workspace.toolUse().get(Tool.GLOSSARY).insertions());
        assertEquals(1, workspace.toolUse().get(Tool.SPELLING).suggestionsAccepted());
        assertTrue(workspace.toolUse().get(Tool.GLOSSARY).queries() >= 1);
    }

    private CheckIssue flag(String word) {
        for (CheckIssue i : workspace.marks().orElseThrow().flags().all()) {
            if (i.end() <= workspace.area().getLength() && workspace.area().getText(i.start(), i.end()).equals(word)) {
                return i;
            }
        }
        return null;
    }
}
