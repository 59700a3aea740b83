package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
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
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 13, "screens that fit", last point: the panel behaves as a writer expects. A word inserted
 * from an entry comes with the spaces a writer would type; the dictionary searches as you type,
 * like the glossary; after a suggestion is used from the panel the candidate is back in the answer,
 * just after the word. Real packs (WordNet 3.1, the invented demo term bank); the flag on "ferie"
 * comes from a stand-in checker.
 */
@ExtendWith(ApplicationExtension.class)
class PanelHabitsTest {

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

    private void open(FxRobot robot, String answer) throws Exception {
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.SUGGESTIONS, TestTools.GLOSSARY, TestTools.DICTIONARY, true,
                true, PastePolicy.NONE);
        TaskTools tools = TestTools.toolsFor(policy, new TestTools.CountingFactory(TestTools.realPacks(),
                (m, words) -> new ScriptedChecker(m, Map.of("ferie", List.of("ferry", "fairy")))));
        workspace = Shown.show(robot, stage, TestTools.context(tools, log, answer, DisplaySettings.standard()),
                new FakeClipboard(null));
    }

    /**
     * Each case: the answer with "|" at the caret, and the answer after inserting "ferry" there.
     * The spacing is the English typing convention (common practice; one space between words and
     * after sentence punctuation, none inside brackets or quotes or before , . ; : ! ? as in the
     * Chicago Manual of Style, 17th ed., 6.7 and 6.11, from memory).
     */
    static final String[][] CASES = {
        {"I took the|", "I took the ferry|"},
        {"I took the |", "I took the ferry|"},
        {"I took the| to work.", "I took the ferry| to work."},
        {"I took the | to work.", "I took the ferry| to work."},
        {"the old|.", "the old ferry|."},
        {"the old|, then", "the old ferry|, then"},
        {"a boat (|) crosses", "a boat (ferry|) crosses"},
        {"a boat (|", "a boat (ferry|"},
        {"It left.|", "It left. ferry|"},
        {"|island", "ferry| island"},
        {"|", "ferry|"},
        {"She said \"|", "She said \"ferry|"},
        {"the \u201C|\u201D", "the \u201Cferry|\u201D"},
        {"the|boat", "the ferry| boat"},
        {"a well-|", "a well-ferry|"},
    };

    @Test
    void insert_fromThePanel_addsTheSpacesAWriterWouldType(FxRobot robot) throws Exception {
        open(robot, "");
        StringBuilder wrong = new StringBuilder();
        for (String[] c : CASES) {
            int at = c[0].indexOf('|');
            String start = c[0].replace("|", "");
            Shown.onFx(robot, () -> {
                workspace.area().replaceText(start);
                workspace.area().moveTo(at);
                workspace.insert(Tool.GLOSSARY, "f001", "ferry");
            });
            String got = workspace.area().getText();
            int caret = workspace.area().getCaretPosition();
            String shown = got.substring(0, caret) + "|" + got.substring(caret);
            if (!shown.equals(c[1])) {
                wrong.append("\n  from \"").append(c[0]).append("\": expected \"").append(c[1]).append("\", got \"")
                        .append(shown).append('"');
            }
        }
        assertEquals("", wrong.toString(), "insertion spacing");
        assertTrue(workspace.area().isFocused(), "after inserting, the candidate is back in the answer");
    }

    @Test
    void insert_throughTheGlossaryPage_spacesTheTermAndReturnsToTheAnswer(FxRobot robot) throws Exception {
        open(robot, "We waited for the");
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.G).release(KeyCode.G, KeyCode.SHIFT, KeyCode.CONTROL);
        robot.write("gangway");
        ListView<?> hits = robot.lookup("#glossaryResults").queryListView();
        Shown.until("glossary hits", () -> !hits.getItems().isEmpty());
        Shown.onFx(robot, () -> workspace.panel().orElseThrow().pages().stream().filter(p -> p instanceof GlossaryPage)
                .forEach(p -> ((GlossaryPage) p).openSelected()));
        ListView<?> terms = robot.lookup("#glossaryInsertable").queryListView();
        Shown.until("the entry's terms", () -> !terms.getItems().isEmpty());
        Shown.onFx(robot, () -> terms.getSelectionModel().select(0));
        String term = (String) terms.getItems().get(0);
        Shown.onFx(robot, () -> robot.lookup("#glossaryInsert").queryButton().fire());
        assertEquals("We waited for the " + term, workspace.area().getText());
        assertTrue(workspace.area().isFocused(), "focus is back in the answer");
        assertEquals(workspace.area().getLength(), workspace.area().getCaretPosition());
    }

    @Test
    void dictionary_searchesAsYouType_likeTheGlossary(FxRobot robot) throws Exception {
        open(robot, "The ferry");
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.D).release(KeyCode.D, KeyCode.SHIFT, KeyCode.CONTROL);
        WaitForAsyncUtils.sleep(2 * (long) GlossaryPage.SEARCH_AFTER.toMillis(), TimeUnit.MILLISECONDS);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(List.of(), log.events(EventType.TOOL_QUERY),
                "the word the page puts in the box when it opens is not a lookup the candidate made");
        robot.eraseText(5).write("crossing"); // no Enter
        ListView<?> entries = robot.lookup("#dictionaryResults").queryListView();
        Shown.until("entries while typing, without Enter", () -> !entries.getItems().isEmpty());
        List<RecordingLog.Event> queries = log.events(EventType.TOOL_QUERY);
        assertEquals("crossing", queries.getLast().get("query"), "the lookup shown is logged, as the glossary's are");
        assertEquals("dictionary", queries.getLast().get("tool"));
        assertTrue(robot.lookup("#dictionaryStatus").queryLabeled().getText().contains("crossing"));
    }

    @Test
    void useSuggestion_fromThePanel_returnsToTheAnswerAfterTheWord(FxRobot robot) throws Exception {
        open(robot, "I took the ferie to work.");
        Shown.until("the flag", () -> !workspace.marks().get().flags().all().isEmpty());
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.K).release(KeyCode.K, KeyCode.SHIFT, KeyCode.CONTROL);
        Shown.onFx(robot, () -> workspace.panel().orElseThrow().pages().stream().filter(p -> p instanceof SuggestionsPage)
                .forEach(p -> ((SuggestionsPage) p).showSelected()));
        Shown.until("suggestions", () -> !robot.lookup("#suggestionList").queryListView().getItems().isEmpty());
        Shown.onFx(robot, () -> robot.lookup("#useSuggestion").queryButton().fire());
        assertEquals("I took the ferry to work.", workspace.area().getText());
        assertTrue(workspace.area().isFocused(), "focus goes back to the answer");
        assertEquals("I took the ferry".length(), workspace.area().getCaretPosition(), "caret at the end of the replaced word");
    }
}
