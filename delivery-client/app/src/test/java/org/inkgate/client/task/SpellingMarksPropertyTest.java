package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Clock;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.MenuItem;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.fxmisc.richtext.model.StyleSpan;
import org.inkgate.packs.event.ToolEvent;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.spelling.CheckIssue;
import org.inkgate.packs.spelling.CheckResult;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingChecker;
import org.inkgate.packs.spelling.SpellingEngine;
import org.inkgate.packs.testutil.TypingScripts;
import org.inkgate.packs.testutil.TypingScripts.Script;
import org.inkgate.packs.testutil.TypingScripts.Step;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 13's property through the task workspace, headless, on real LanguageTool: the seeded
 * typing scripts of {@link TypingScripts} (the same ones the engine's property test plays) are
 * typed by the robot as key events, with real stops, Backspace, copy and paste within the answer
 * and suggestions accepted from the editor's menu (Shift+F10). Once the checker settles, the
 * flags, and the underlines the candidate sees, equal what a newly built checker finds in the
 * final text (the cache-less reference engine, itself checked against a new engine in
 * resource-packs). The final text must also be exactly what the script typed.
 *
 * <p>One engine serves every script, as it would serve a long task; {@code -Dinkgate.typing.scripts=N}
 * types N scripts (default 3), {@code -Dinkgate.typing.scripts.seed=S} starts at seed S.
 */
@ExtendWith(ApplicationExtension.class)
class SpellingMarksPropertyTest {

    private static SpellingEngine live;
    private static SpellingEngine reference;
    private Stage stage;
    private WritingWorkspace workspace;

    @BeforeAll
    static void engines() {
        live = SpellingEngine.create(EnglishVariant.EN_GB, SpellingMode.SUGGESTIONS, List.of(), Clock.systemUTC());
        reference = SpellingEngine.withoutCaches(EnglishVariant.EN_GB, SpellingMode.SUGGESTIONS, List.of(), Clock.systemUTC());
        CompletableFuture.allOf(live.warmUp(), reference.warmUp()).join();
    }

    @AfterAll
    static void closeEngines() {
        live.close();
        reference.close();
    }

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

    static List<Long> seeds() {
        return TypingScripts.seeds("inkgate.typing.scripts", 3, 1);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void typingScript_marksAfterSettling_equalANewCheckersOnTheFinalText(long seed, FxRobot robot) throws Exception {
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.SUGGESTIONS, null, null, false, true, PastePolicy.WITHIN_RESPONSE);
        var tools = TestTools.toolsFor(policy, new TestTools.CountingFactory(TestTools.realPacks(), (m, words) -> new KeptOpen(live)));
        workspace = Shown.show(robot, stage, TestTools.context(tools, new RecordingLog(), "", DisplaySettings.standard()),
                new FakeClipboard(null));
        Script script = TypingScripts.generate(seed);
        String rerun = script + " (rerun with -Dinkgate.typing.scripts=1 -Dinkgate.typing.scripts.seed=" + seed + ")";

        String typed = play(robot, script);
        assertEquals(typed, workspace.text(), rerun + ": the answer is not what was typed");
        List<CheckIssue> expected = reference.check(typed).join().issues();
        AtomicReference<String> last = new AtomicReference<>("");
        try {
            WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> {
                WaitForAsyncUtils.waitForFxEvents();
                AtomicReference<String> seen = new AtomicReference<>();
                robot.interact(() -> seen.set(difference(expected)));
                last.set(seen.get());
                return seen.get().isEmpty();
            });
        } catch (java.util.concurrent.TimeoutException e) {
            throw new AssertionError(rerun + ": marks never matched a new checker's on the final text:\n" + last.get()
                    + "\nfinal text:\n" + typed, e);
        }
    }

    /** What differs between the flags and underlines shown and the expected flags; empty when nothing does. */
    private String difference(List<CheckIssue> expected) {
        List<CheckIssue> shown = workspace.marks().orElseThrow().flags().all();
        if (!shown.equals(expected)) {
            return "flags shown " + shown + "\nexpected     " + expected;
        }
        AnswerArea area = workspace.area();
        List<String> wrong = new ArrayList<>();
        int at = 0;
        for (StyleSpan<Collection<String>> span : area.getStyleSpans(0, area.getLength())) {
            for (int p = at; p < at + span.getLength(); p++) {
                Set<String> want = styleAt(expected, p);
                if (!want.equals(Set.copyOf(span.getStyle())) && area.getText().charAt(p) != '\n') {
                    wrong.add(p + " '" + area.getText().charAt(p) + "' " + span.getStyle() + " (expected " + want + ")");
                }
            }
            at += span.getLength();
        }
        return wrong.isEmpty() ? "" : "underlines differ from the flags at " + wrong;
    }

    private static Set<String> styleAt(List<CheckIssue> flags, int p) {
        for (CheckIssue i : flags) {
            if (i.start() <= p && p < i.end()) {
                return Set.of(i.kind() == CheckIssue.Kind.GRAMMAR ? SpellingMarks.GRAMMAR_STYLE : SpellingMarks.SPELLING_STYLE);
            }
        }
        return Set.of();
    }

    /** Types the script through the robot; returns the text it should leave. */
    private String play(FxRobot robot, Script script) {
        TypingScripts.Text t = new TypingScripts.Text();
        AnswerArea area = workspace.area();
        for (Step step : script.steps()) {
            switch (step) {
                case Step.Type type -> {
                    if (type.text().equals("\n")) {
                        robot.type(KeyCode.ENTER);
                    } else {
                        robot.write(type.text(), 0); // the script's stops give the rhythm; the robot adds its own per-key time
                    }
                    t.type(type.text());
                }
                case Step.Pause pause -> WaitForAsyncUtils.sleep(pause.millis(), TimeUnit.MILLISECONDS);
                case Step.MoveCaret move -> {
                    t.moveCaret(move.where());
                    Shown.onFx(robot, () -> area.moveTo(t.caret()));
                }
                case Step.Backspace back -> {
                    int n = t.backspace(back.count());
                    if (n > 0) {
                        robot.type(KeyCode.BACK_SPACE, n);
                    }
                }
                case Step.Paste paste -> {
                    int[] range = t.pasteRange(paste);
                    if (range[1] > range[0]) {
                        Shown.onFx(robot, () -> area.selectRange(range[0], range[1]));
                        robot.press(KeyCode.CONTROL, KeyCode.C).release(KeyCode.C, KeyCode.CONTROL);
                        Shown.onFx(robot, () -> area.moveTo(t.caret()));
                        robot.press(KeyCode.CONTROL, KeyCode.V).release(KeyCode.V, KeyCode.CONTROL);
                        t.paste(paste);
                    }
                }
                case Step.AcceptSuggestion accept -> acceptSuggestion(robot, t, accept);
            }
        }
        WaitForAsyncUtils.waitForFxEvents();
        return t.text();
    }

    /** Opens the editor's menu on a flag with suggestions (Shift+F10) and takes the first suggestion. */
    private void acceptSuggestion(FxRobot robot, TypingScripts.Text t, Step.AcceptSuggestion accept) {
        AtomicReference<CheckIssue> target = new AtomicReference<>();
        Shown.onFx(robot, () -> {
            List<CheckIssue> offered = workspace.marks().orElseThrow().flags().all().stream()
                    .filter(i -> !i.suggestions().isEmpty()).toList();
            if (!offered.isEmpty()) {
                CheckIssue i = offered.get(Math.min(offered.size() - 1, (int) (accept.which() * offered.size())));
                target.set(i);
                workspace.area().moveTo(i.start() + 1);
            }
        });
        if (target.get() == null) {
            return;
        }
        robot.press(KeyCode.SHIFT, KeyCode.F10).release(KeyCode.F10, KeyCode.SHIFT);
        Shown.until("the suggestion menu", () -> menu() != null);
        Shown.onFx(robot, () -> {
            ContextMenu menu = menu();
            CheckIssue flag = (CheckIssue) menu.getUserData(); // the flag the menu was built for
            String first = flag.suggestions().get(0);
            MenuItem item = menu.getItems().stream().filter(m -> first.equals(m.getText())).findFirst().orElseThrow();
            item.fire();
            menu.hide();
            t.replace(flag.start(), flag.end(), first);
        });
    }

    private static ContextMenu menu() {
        return Window.getWindows().stream().filter(w -> w instanceof ContextMenu && w.isShowing())
                .map(w -> (ContextMenu) w).findFirst().orElse(null);
    }

    /** The shared engine under the workspace, which closes its tools: closing leaves the engine to the next script. */
    private record KeptOpen(SpellingChecker engine) implements SpellingChecker {
        @Override
        public SpellingMode mode() {
            return engine.mode();
        }

        @Override
        public EnglishVariant variant() {
            return engine.variant();
        }

        @Override
        public CompletableFuture<Void> warmUp() {
            return engine.warmUp();
        }

        @Override
        public CompletableFuture<CheckResult> check(String text) {
            return engine.check(text);
        }

        @Override
        public ToolEvent ignoreWord(String word) {
            return engine.ignoreWord(word);
        }

        @Override
        public Set<String> ignoredWords() {
            return engine.ignoredWords();
        }

        @Override
        public void close() {
        }
    }
}
