package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.Labeled;
import javafx.scene.control.TextInputControl;
import javafx.scene.control.Tooltip;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.testutil.DemoSource;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Reads every text in a scene graph (labels, fields, text nodes, accessible names, tooltips, the
 * window title) and fails when one names something a rater must not see: a candidate number,
 * level, form or condition of the responses, or a writing tool. Whole words, so a random blind
 * id that happens to hold "B1" inside it is no false alarm.
 */
final class BlindnessScan {

    /** The tool names of the resource policy (docs/formats.md) and the word that groups them. */
    static final List<String> TOOL_WORDS = List.of("spelling", "spell", "grammar", "glossary", "dictionary", "thesaurus",
            "tool", "tools", "resources", "word count");

    private final List<Pattern> forbidden = new ArrayList<>();
    private int textsSeen;

    private BlindnessScan(List<String> terms) {
        for (String t : terms) {
            if (t != null && !t.isBlank()) {
                forbidden.add(Pattern.compile("(?<![\\p{L}\\p{N}])" + Pattern.quote(t) + "(?![\\p{L}\\p{N}])",
                        Pattern.CASE_INSENSITIVE | Pattern.UNICODE_CASE));
            }
        }
    }

    /** The given hidden facts, plus the demo exam's condition ids and labels and the tool words. */
    static BlindnessScan forDemoExam(List<String> hiddenFacts) throws Exception {
        ExamSource exam = ExamSourceReader.read(DemoSource.DEMO.resolve("exam-source"));
        List<String> terms = new ArrayList<>(hiddenFacts);
        exam.conditions().forEach(c -> {
            terms.add(c.id());
            terms.add(c.label());
        });
        terms.addAll(TOOL_WORDS);
        return new BlindnessScan(terms);
    }

    int textsSeen() {
        return textsSeen;
    }

    /** Fails naming the screen, the text and the term when any visible text names a forbidden term. */
    void check(Scene scene, String screen) throws Exception {
        List<String> texts = new ArrayList<>();
        WaitForAsyncUtils.asyncFx(() -> {
            if (scene.getWindow() instanceof Stage s) {
                texts.add(s.getTitle());
            }
            collect(scene.getRoot(), texts);
        }).get(5, TimeUnit.SECONDS);
        for (String text : texts) {
            if (text == null) {
                continue;
            }
            textsSeen++;
            for (Pattern p : forbidden) {
                assertTrue(!p.matcher(text).find(), screen + ": the screen shows \"" + p.pattern() + "\" in: " + text);
            }
        }
    }

    private static void collect(Node node, List<String> texts) {
        if (!node.isVisible()) {
            return;
        }
        texts.add(node.getAccessibleText());
        texts.add(node.getAccessibleHelp());
        switch (node) {
            case Labeled l -> {
                texts.add(l.getText());
                Tooltip t = l.getTooltip();
                if (t != null) {
                    texts.add(t.getText());
                }
            }
            case TextInputControl t -> texts.add(t.getText());
            case Text t -> texts.add(t.getText());
            default -> {
            }
        }
        if (node instanceof Parent p) {
            for (Node child : p.getChildrenUnmodifiable()) {
                collect(child, texts);
            }
        }
    }
}
