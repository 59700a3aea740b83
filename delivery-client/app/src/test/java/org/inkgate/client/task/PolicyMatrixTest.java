package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.format.response.EventType;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * For every combination of spelling mode, glossary, dictionary, insert-from-panel and word count
 * (4 x 2 x 2 x 2 x 2 = 64), exactly the allowed tools are constructed (counted at the factory),
 * visible, and reachable by mouse, by their keyboard shortcut and by focus traversal; forbidden
 * ones are none of these. The rule checked is the policy model's own (docs/formats.md, "policy").
 */
@ExtendWith(ApplicationExtension.class)
class PolicyMatrixTest {

    private static final String START = "A short answer.";
    private Stage stage;
    private WritingWorkspace workspace;

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

    static Stream<Arguments> everyPolicy() {
        List<Arguments> out = new ArrayList<>();
        for (SpellingMode mode : SpellingMode.values()) {
            for (String g : Arrays.asList(null, TestTools.GLOSSARY)) {
                for (String d : Arrays.asList(null, TestTools.DICTIONARY)) {
                    for (boolean insert : new boolean[] {false, true}) {
                        for (boolean count : new boolean[] {false, true}) {
                            out.add(Arguments.of(new ResourcePolicy(mode, g, d, insert, count, PastePolicy.NONE)));
                        }
                    }
                }
            }
        }
        return out.stream();
    }

    /** The panel pages a policy should give: the rule, restated independently of the workspace. */
    private static Set<Tool> expectedPages(ResourcePolicy p) {
        Set<Tool> pages = EnumSet.noneOf(Tool.class);
        if (p.dictionaryPack() != null) {
            pages.add(Tool.DICTIONARY);
        }
        if (p.glossaryPack() != null) {
            pages.add(Tool.GLOSSARY);
        }
        if (p.spelling() == SpellingMode.SUGGESTIONS || p.spelling() == SpellingMode.SPELLING_AND_GRAMMAR) {
            pages.add(Tool.SPELLING);
        }
        return pages;
    }

    private static final Map<Tool, String> START_NODE = Map.of(Tool.DICTIONARY, "#dictionaryQuery", Tool.GLOSSARY, "#glossaryQuery",
            Tool.SPELLING, "#flagList");
    private static final Map<Tool, KeyCode> SHORTCUT = Map.of(Tool.DICTIONARY, KeyCode.D, Tool.GLOSSARY, KeyCode.G, Tool.SPELLING, KeyCode.K);

    @ParameterizedTest(name = "{0}")
    @MethodSource("everyPolicy")
    void workspace_everyPolicy_offersExactlyTheAllowedTools(ResourcePolicy policy, FxRobot robot) throws Exception {
        RecordingLog log = new RecordingLog();
        TestTools.CountingFactory factory = new TestTools.CountingFactory(TestTools.realPacks(),
                (m, words) -> new ScriptedChecker(m, Map.of()));
        TaskTools tools = TestTools.toolsFor(policy, factory);
        // constructed: exactly what the policy allows
        for (Tool t : Tool.values()) {
            assertEquals(policy.allows(t) ? 1 : 0, factory.built.getOrDefault(t, 0), t + " constructed under " + policy);
        }
        workspace = Shown.show(robot, stage, TestTools.context(tools, log, START, DisplaySettings.standard()), new FakeClipboard(null));
        Set<Tool> pages = expectedPages(policy);

        // visible
        assertEquals(!pages.isEmpty(), robot.lookup("#resourcePanel").tryQuery().isPresent(), "panel shown only with tools");
        for (Tool t : List.of(Tool.DICTIONARY, Tool.GLOSSARY, Tool.SPELLING)) {
            String id = "#tab-" + TaskEvents.wire(t);
            assertEquals(pages.contains(t), robot.lookup(id).tryQuery().isPresent(), id + " under " + policy);
            assertEquals(pages.contains(t), robot.lookup(START_NODE.get(t)).tryQuery().isPresent(), START_NODE.get(t) + " under " + policy);
        }
        boolean insert = policy.insertFromPanel();
        assertEquals(insert && pages.contains(Tool.DICTIONARY), robot.lookup("#dictionaryInsert").tryQuery().isPresent());
        assertEquals(insert && pages.contains(Tool.GLOSSARY), robot.lookup("#glossaryInsert").tryQuery().isPresent());
        assertEquals(policy.showWordCount(), robot.lookup("#wordCount").tryQuery().isPresent(), "word count only when shown");
        assertEquals(tools.offered(), workspace.toolUse().keySet(), "tool use is kept for offered tools only");

        // reachable by keyboard shortcut; a forbidden tool's key does nothing and types nothing
        for (Tool t : List.of(Tool.DICTIONARY, Tool.GLOSSARY, Tool.SPELLING)) {
            Shown.onFx(robot, workspace::focusEditor);
            robot.press(KeyCode.CONTROL, KeyCode.SHIFT, SHORTCUT.get(t)).release(SHORTCUT.get(t), KeyCode.SHIFT, KeyCode.CONTROL);
            Node focused = stage.getScene().getFocusOwner();
            if (pages.contains(t)) {
                assertTrue(inside(focused, robot.lookup(START_NODE.get(t)).query()), t + " shortcut reaches its page, focus on " + focused);
            } else {
                assertTrue(workspace.area().isFocused(), t + " shortcut must not leave the answer under " + policy + ", focus on " + focused);
            }
        }
        assertEquals(START, workspace.text(), "no shortcut typed anything");

        // reachable by focus traversal (Tab, Ctrl+Tab out of the answer, arrow keys across the tabs)
        assertEquals(pages, reachedByTraversal(robot, pages.size()), "focus traversal under " + policy);
        assertEquals(START, workspace.text(), "traversal typed nothing");

        // reachable by mouse: click each tab, then its first control
        for (Tool t : pages) {
            robot.clickOn("#tab-" + TaskEvents.wire(t));
            Node start = robot.lookup(START_NODE.get(t)).query();
            assertTrue(start.isVisible() && start.getParent().isVisible(), t + " page shown on click");
            robot.clickOn(start);
            assertTrue(inside(stage.getScene().getFocusOwner(), start), t + " control takes the click");
        }
        for (RecordingLog.Event e : log.events(EventType.PANEL_OPEN)) {
            assertTrue(pages.contains(Tool.valueOf(((String) e.get("tool")).toUpperCase(java.util.Locale.ROOT))), "panel.open only for offered tools: " + e);
        }
        if (pages.isEmpty()) {
            assertTrue(log.events(EventType.PANEL_OPEN).isEmpty());
        }
    }

    /**
     * Walks the focus order once round: Ctrl+Tab out of the answer, Tab through everything, the
     * arrow key to move along the panel's tabs, until focus is back in the answer with every tab seen.
     */
    private Set<Tool> reachedByTraversal(FxRobot robot, int tabs) {
        Set<Tool> reached = EnumSet.noneOf(Tool.class);
        Shown.onFx(robot, workspace::focusEditor);
        int rights = 0;
        for (int step = 0; step < 80; step++) {
            Node f = stage.getScene().getFocusOwner();
            for (Tool t : List.of(Tool.DICTIONARY, Tool.GLOSSARY, Tool.SPELLING)) {
                robot.lookup(START_NODE.get(t)).tryQuery().ifPresent(n -> {
                    if (inside(f, pageOf(n))) {
                        reached.add(t);
                    }
                });
            }
            if (workspace.area().isFocused()) {
                if (step > 0 && rights >= tabs) {
                    return reached;
                }
                robot.press(KeyCode.CONTROL, KeyCode.TAB).release(KeyCode.TAB, KeyCode.CONTROL);
            } else if (f != null && "toolTabs".equals(f.getId()) && rights < tabs) {
                if (rights > 0) {
                    robot.type(KeyCode.RIGHT);
                }
                rights++;
                robot.type(KeyCode.TAB);
            } else {
                robot.type(KeyCode.TAB);
            }
        }
        throw new AssertionError("focus never came back to the answer: a keyboard trap? reached " + reached);
    }

    private static Node pageOf(Node n) {
        for (Node p = n; p != null; p = p.getParent()) {
            if (p.getStyleClass().contains("tool-page")) {
                return p;
            }
        }
        throw new AssertionError(n + " is not on a tool page");
    }

    private static boolean inside(Node focused, Node container) {
        for (Node n = focused; n != null; n = n.getParent()) {
            if (n == container) {
                return true;
            }
        }
        return false;
    }
}
