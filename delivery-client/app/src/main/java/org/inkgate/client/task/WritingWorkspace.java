package org.inkgate.client.task;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.value.ObservableBooleanValue;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.IndexRange;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SplitPane;
import javafx.scene.input.ContextMenuEvent;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.fxmisc.flowless.VirtualizedScrollPane;
import org.inkgate.client.practice.PromptText;
import org.inkgate.client.practice.WordCount;
import org.inkgate.client.practice.ui.PromptView;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.CheckIssue;
import org.inkgate.packs.spelling.SpellingChecker;

/**
 * The task workspace of a sitting: prompt, answer editor and (only when the task offers tools)
 * the resource panel. Everything the candidate does to the text or with a tool goes to the
 * process log as it happens; see {@link TaskWorkspaces} for how to make one.
 */
final class WritingWorkspace implements TaskWorkspace, PanelActions {

    private final TaskTools tools;
    private final ResourcePolicy policy;
    private final TaskEvents events;
    private final ToolTally tally;
    private final AnswerArea area;
    private final WordStatus status;
    private final BorderPane root = new BorderPane();
    private final ReadOnlyBooleanWrapper frozen = new ReadOnlyBooleanWrapper(false);
    private final Lookups lookups;
    private final SpellingMarks marks;
    private final Suggestions suggestions;
    private final ResourcePanel panel;
    private final ToolKeys keys;
    private ContextMenu openMenu;
    private boolean closed;

    WritingWorkspace(TaskContext context, ClipboardAccess clipboard) {
        this.tools = context.tools();
        this.policy = tools.policy();
        // a task re-entered after a crash counts on from its events logged before (none for a new task)
        this.tally = ToolTally.rebuilt(tools.offered(), context.loggedBefore());
        this.events = new TaskEvents(context.log(), context.task().id(), tally);
        this.lookups = new Lookups(context.task().id());
        this.area = new AnswerArea(new PasteGate(policy.paste()), clipboard, this::pasteRefused);
        area.setId("answer");
        area.setAccessibleText("Your answer to " + context.task().title());
        this.status = new WordStatus(policy.showWordCount(), context.task().words());

        // the starting (or recovered) text is not a change the candidate made: set it before listening
        String start = context.startText();
        if (!start.isEmpty()) {
            area.replaceText(start);
        }
        area.moveTo(Math.max(0, Math.min(context.startCaret(), start.length())));
        area.getUndoManager().forgetHistory();

        Optional<SpellingChecker> checker = tools.spelling();
        this.marks = checker.map(c -> new SpellingMarks(area, c, events, this::flagsChanged, this::checkerFailed)).orElse(null);
        this.suggestions = checker.filter(c -> c.mode().offersSuggestions())
                .map(c -> new Suggestions(area, c, marks, events)).orElse(null);

        List<ToolPage> pages = new ArrayList<>();
        tools.dictionary().ifPresent(d -> pages.add(new DictionaryPage(d, events, this, lookups)));
        tools.glossary().ifPresent(g -> pages.add(new GlossaryPage(g, events, this, lookups)));
        if (suggestions != null) {
            pages.add(new SuggestionsPage(suggestions, this, checker.get().mode().checksGrammar()));
        }
        this.keys = new ToolKeys(pages.stream().map(ToolPage::tool).toList());
        this.panel = pages.isEmpty() ? null : new ResourcePanel(pages, events, keys.help());
        if (panel != null) {
            panel.disableProperty().bind(frozen); // frozen: the panel answers nothing
        }

        layout(context);
        listen();
        status.words(WordCount.of(area.getText()));
        if (marks != null) {
            marks.checkNow();
        }
    }

    private void layout(TaskContext context) {
        root.getStyleClass().add("task-workspace");
        root.setId("taskWorkspace");
        root.getStylesheets().add(WritingWorkspace.class.getResource("workspace.css").toExternalForm());
        root.getStylesheets().add(DisplayStyle.stylesheet(context.display()));
        if (context.display().highContrast()) {
            root.getStyleClass().add("high-contrast");
        }

        PromptView prompt = new PromptView();
        prompt.setId("prompt");
        PromptText text = PromptText.parse(context.promptMarkdown() == null ? "" : context.promptMarkdown());
        prompt.show(text);
        VBox promptBox = new VBox(12, prompt);
        // the task's title heads the prompt, unless the prompt opens with its own heading
        if (text.blocks().isEmpty() || text.blocks().get(0).kind() != PromptText.Kind.HEADING) {
            Label title = ToolPage.wrapped(context.task().title(), "task-title");
            title.setId("taskTitle");
            promptBox.getChildren().add(0, title);
        }
        promptBox.getStyleClass().add("prompt-box");
        ScrollPane promptScroll = new ScrollPane(promptBox);
        promptScroll.setId("promptScroll");
        promptScroll.setFitToWidth(true);
        promptScroll.setFocusTraversable(true); // so the prompt can be reached and scrolled from the keyboard
        promptScroll.setAccessibleText("The task");
        promptScroll.getStyleClass().add("prompt-scroll");

        Label heading = new Label("Your _answer");
        heading.setMnemonicParsing(true);
        heading.setLabelFor(area);
        heading.getStyleClass().add("answer-heading");
        heading.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        VirtualizedScrollPane<AnswerArea> scroll = new VirtualizedScrollPane<>(area);
        scroll.getStyleClass().add("answer-scroll");
        // the frame draws the border and the focus ring (the scroll pane lays its content over its own insets)
        StackPane frame = new StackPane(scroll);
        frame.getStyleClass().add("answer-frame");
        VBox.setVgrow(frame, Priority.ALWAYS);
        VBox answer = new VBox(8, heading, frame, status);
        answer.getStyleClass().add("answer-column");

        SplitPane columns = new SplitPane();
        columns.setOrientation(Orientation.HORIZONTAL);
        columns.getItems().addAll(promptScroll, answer);
        if (panel != null) {
            columns.getItems().add(panel);
            columns.setDividerPositions(0.28, 0.70);
        } else {
            columns.setDividerPositions(0.34);
        }
        root.setCenter(columns);
    }

    private void listen() {
        area.plainTextChanges().subscribe(change -> {
            String removed = change.getRemoved();
            String inserted = change.getInserted();
            int pos = change.getPosition();
            String source = area.source().wire();
            if (!removed.isEmpty()) {
                events.record(EventType.TEXT_DELETE, "pos", pos, "len", removed.length(), "text", removed, "source", source);
            }
            if (!inserted.isEmpty()) {
                events.record(EventType.TEXT_INSERT, "pos", pos, "len", inserted.length(), "text", inserted, "source", source);
            }
            if (marks != null) {
                marks.edited(new TextEdit(pos, removed, inserted));
            }
            String text = area.getText();
            status.words(WordCount.of(text));
            events.snapshot(text, pos + inserted.length());
        });
        root.addEventFilter(KeyEvent.KEY_PRESSED, this::shortcut);
        if (suggestions != null) {
            area.setOnContextMenuRequested(this::contextMenu);
        } else {
            // no suggestions in this task: not even an empty menu
            area.addEventFilter(ContextMenuEvent.CONTEXT_MENU_REQUESTED, ContextMenuEvent::consume);
        }
    }

    private void shortcut(KeyEvent e) {
        if (suggestions != null && area.isFocused()
                && (e.getCode() == KeyCode.CONTEXT_MENU || (e.getCode() == KeyCode.F10 && e.isShiftDown()))) {
            e.consume();
            showSuggestionsAtCaret();
            return;
        }
        if (panel == null) {
            return; // a task without tools answers no panel key at all
        }
        Tool tool = keys.match(e);
        if (tool != null) {
            e.consume();
            if (!frozen.get()) {
                panel.open(tool);
            }
        } else if (ToolKeys.SWITCH.match(e)) {
            e.consume();
            if (area.isFocused() && !frozen.get()) {
                panel.focusInView();
            } else {
                area.requestFocus();
            }
        } else if (e.getCode() == KeyCode.ESCAPE && !area.isFocused() && isInPanel(e.getTarget())) {
            e.consume();
            area.requestFocus();
        }
    }

    private boolean isInPanel(Object target) {
        for (Node n = target instanceof Node node ? node : null; n != null; n = n.getParent()) {
            if (n == panel) {
                return true;
            }
        }
        return false;
    }

    private void contextMenu(ContextMenuEvent e) {
        e.consume();
        if (frozen.get()) {
            return;
        }
        int at = e.isKeyboardTrigger() ? area.getCaretPosition() : area.hit(e.getX(), e.getY()).getInsertionIndex();
        Optional<CheckIssue> flag = marks.flags().at(at);
        if (flag.isEmpty()) {
            return;
        }
        if (openMenu != null && openMenu.isShowing()) {
            if (flag.get().equals(openMenu.getUserData())) {
                return; // the same request twice (key and platform event): show and log once
            }
            openMenu.hide();
        }
        suggestions.shown(flag.get());
        openMenu = suggestions.menuFor(flag.get());
        openMenu.setUserData(flag.get());
        double x = e.getScreenX();
        double y = e.getScreenY();
        if (e.isKeyboardTrigger()) {
            Optional<javafx.geometry.Bounds> b = area.getCharacterBoundsOnScreen(flag.get().start(), Math.max(flag.get().start() + 1, flag.get().end()));
            if (b.isPresent()) {
                x = b.get().getMinX();
                y = b.get().getMaxY();
            }
        }
        openMenu.show(area, x, y);
    }

    /** Opens the suggestion menu for the flag at the caret (the keyboard's way to it). */
    boolean showSuggestionsAtCaret() {
        if (suggestions == null || frozen.get()) {
            return false;
        }
        Optional<javafx.geometry.Bounds> caret = area.getCharacterBoundsOnScreen(Math.max(0, area.getCaretPosition() - 1),
                Math.max(1, area.getCaretPosition()));
        double x = caret.map(javafx.geometry.Bounds::getMinX).orElse(0.0);
        double y = caret.map(javafx.geometry.Bounds::getMaxY).orElse(0.0);
        area.fireEvent(new ContextMenuEvent(ContextMenuEvent.CONTEXT_MENU_REQUESTED, 0, 0, x, y, true, null));
        return openMenu != null && openMenu.isShowing();
    }

    private void flagsChanged(List<CheckIssue> flags) {
        if (panel != null) {
            for (ToolPage p : pagesOf(SuggestionsPage.class)) {
                ((SuggestionsPage) p).update(flags);
            }
        }
    }

    private void checkerFailed(Throwable cause) {
        status.checkerNote("The spelling check stopped working; your answer is safe. Tell the invigilator if you need it.");
    }

    private List<ToolPage> pagesOf(Class<?> kind) {
        List<ToolPage> out = new ArrayList<>();
        if (panel != null) {
            out.addAll(panel.pages().stream().filter(kind::isInstance).toList());
        }
        return out;
    }

    private void pasteRefused(PasteGate.Refuse refuse) {
        events.record(EventType.PASTE_REFUSED, "reason", refuse.reason(), "len", refuse.length());
        status.checkerNote(refuse.reason().equals(PasteGate.FORBIDDEN)
                ? "Pasting is not allowed in this task."
                : "Only text copied from your own answer can be pasted here.");
    }

    // ---- PanelActions

    @Override
    public boolean insertAllowed() {
        return policy.insertFromPanel();
    }

    @Override
    public void insert(Tool tool, String entryId, String text) {
        if (!policy.insertFromPanel() || frozen.get() || closed || text == null || text.isEmpty()) {
            return;
        }
        IndexRange selection = area.getSelection();
        events.record(EventType.TOOL_INSERT, "tool", TaskEvents.wire(tool), "entry", entryId, "pos", selection.getStart(), "text", text);
        InsertSpacing.Spaced spaced = InsertSpacing.around(area.getText(), selection.getStart(), selection.getEnd(), text);
        area.changeAs(ChangeSource.PANEL, () -> area.replaceSelection(spaced.text()));
        area.moveTo(selection.getStart() + spaced.caret());
        area.requestFocus();
    }

    @Override
    public String wordAtCaret() {
        String text = area.getText();
        int caret = Math.min(area.getCaretPosition(), text.length());
        int from = caret;
        while (from > 0 && isWordChar(text.charAt(from - 1))) {
            from--;
        }
        int to = caret;
        while (to < text.length() && isWordChar(text.charAt(to))) {
            to++;
        }
        return text.substring(from, to).replaceAll("^['\u2019-]+|['\u2019-]+$", "");
    }

    private static boolean isWordChar(char c) {
        return Character.isLetterOrDigit(c) || c == '\'' || c == '\u2019' || c == '-';
    }

    @Override
    public void backToAnswer() {
        area.requestFocus();
    }

    @Override
    public ObservableBooleanValue frozen() {
        return frozen.getReadOnlyProperty();
    }

    // ---- TaskWorkspace

    @Override
    public Parent view() {
        return root;
    }

    @Override
    public String text() {
        return area.getText();
    }

    @Override
    public int caret() {
        return area.getCaretPosition();
    }

    @Override
    public int wordCount() {
        return WordCount.of(area.getText());
    }

    @Override
    public void setFrozen(boolean freeze) {
        frozen.set(freeze);
        area.setEditable(!freeze);
        if (freeze && openMenu != null) {
            openMenu.hide();
        }
    }

    @Override
    public void focusEditor() {
        area.requestFocus();
    }

    @Override
    public Map<Tool, ToolUse> toolUse() {
        return tally.snapshot();
    }

    @Override
    public void close() {
        if (closed) {
            return;
        }
        closed = true;
        setFrozen(true);
        events.snapshot(area.getText(), area.getCaretPosition());
        if (panel != null) {
            panel.closed();
        }
        if (marks != null) {
            marks.close();
        }
        lookups.close();
        tools.close();
    }

    // ---- for tests in this package

    AnswerArea area() {
        return area;
    }

    Optional<ResourcePanel> panel() {
        return Optional.ofNullable(panel);
    }

    Optional<SpellingMarks> marks() {
        return Optional.ofNullable(marks);
    }
}
