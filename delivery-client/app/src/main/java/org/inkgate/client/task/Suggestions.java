package org.inkgate.client.task;

import java.util.ArrayList;
import java.util.List;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SeparatorMenuItem;
import org.inkgate.format.response.EventType;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.CheckIssue;
import org.inkgate.packs.spelling.SpellingChecker;

/**
 * Showing, accepting and ignoring the checker's suggestions, from the editor's context menu or the
 * panel's list. Exists only in modes that offer suggestions; underline-only tasks never build it.
 */
final class Suggestions {

    private final AnswerArea area;
    private final SpellingChecker checker;
    private final SpellingMarks marks;
    private final TaskEvents events;

    Suggestions(AnswerArea area, SpellingChecker checker, SpellingMarks marks, TaskEvents events) {
        if (!checker.mode().offersSuggestions()) {
            throw new IllegalStateException("the task's spelling mode " + checker.mode() + " offers no suggestions");
        }
        this.area = area;
        this.checker = checker;
        this.marks = marks;
        this.events = events;
    }

    static Tool toolOf(CheckIssue i) {
        return i.kind() == CheckIssue.Kind.GRAMMAR ? Tool.GRAMMAR : Tool.SPELLING;
    }

    /** The flagged text as it stands in the answer. */
    String word(CheckIssue i) {
        int end = Math.min(i.end(), area.getLength());
        return i.start() < end ? area.getText(i.start(), end) : "";
    }

    /** Records that the suggestions for this flag were put in front of the candidate. */
    void shown(CheckIssue i) {
        events.record(EventType.SUGGESTION_SHOW, "tool", TaskEvents.wire(toolOf(i)), "rule", i.ruleId(), "pos", i.start(),
                "len", i.end() - i.start(), "word", word(i), "suggestions", String.join(" | ", i.suggestions()));
    }

    /** Replaces the flagged text by the chosen suggestion. */
    void accept(CheckIssue i, String replacement) {
        if (!area.isEditable() || !marks.flags().all().contains(i)) {
            return; // frozen, or the flag went stale while the menu was open
        }
        String from = word(i);
        events.record(EventType.SUGGESTION_ACCEPT, "tool", TaskEvents.wire(toolOf(i)), "rule", i.ruleId(), "pos", i.start(),
                "from", from, "to", replacement);
        area.changeAs(ChangeSource.SUGGESTION, () -> area.replaceText(i.start(), i.end(), replacement));
        area.moveTo(i.start() + replacement.length());
        // from the panel's list as from the menu: the candidate goes on writing where the word was
        area.requestFocus();
    }

    /** Stops flagging this spelling for the rest of the task. */
    void ignore(CheckIssue i) {
        if (i.kind() != CheckIssue.Kind.SPELLING || !area.isEditable()) {
            return;
        }
        String word = word(i);
        if (word.isBlank()) {
            return;
        }
        checker.ignoreWord(word);
        events.record(EventType.SUGGESTION_IGNORE, "tool", TaskEvents.wire(Tool.SPELLING), "rule", i.ruleId(), "word", word);
        List<CheckIssue> same = new ArrayList<>();
        for (CheckIssue f : marks.flags().all()) {
            if (f.kind() == CheckIssue.Kind.SPELLING && word.equals(word(f))) {
                same.add(f);
            }
        }
        marks.forget(same);
    }

    /** The editor's menu for one flag: its suggestions, then "ignore" for a spelling. */
    ContextMenu menuFor(CheckIssue i) {
        ContextMenu menu = new ContextMenu();
        menu.setId("suggestionMenu");
        MenuItem heading = new MenuItem(i.message());
        heading.setDisable(true);
        menu.getItems().add(heading);
        if (i.suggestions().isEmpty()) {
            MenuItem none = new MenuItem("No suggestions");
            none.setDisable(true);
            menu.getItems().add(none);
        }
        for (String s : i.suggestions()) {
            MenuItem item = new MenuItem(s.isEmpty() ? "(remove)" : s);
            item.setMnemonicParsing(false);
            item.getStyleClass().add("suggestion-item");
            item.setOnAction(e -> accept(i, s));
            menu.getItems().add(item);
        }
        if (i.kind() == CheckIssue.Kind.SPELLING) {
            menu.getItems().add(new SeparatorMenuItem());
            MenuItem ignore = new MenuItem("Ignore this word in this task");
            ignore.setId("ignoreWord");
            ignore.setOnAction(e -> ignore(i));
            menu.getItems().add(ignore);
        }
        return menu;
    }
}
