package org.inkgate.client.sitting.ui;

import java.util.Map;
import javafx.scene.Parent;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.inkgate.client.practice.WordCount;
import org.inkgate.client.task.TaskContext;
import org.inkgate.client.task.TaskWorkspace;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.Tool;

/**
 * TEST DOUBLE: a plain TextArea standing in for the real task workspace (i4-task's), so the flow
 * can be driven before and independently of it. It logs inserts and deletes like the real one
 * and offers snapshots; it has no resource panel and reports every offered tool as unused.
 */
public final class TextAreaWorkspace implements TaskWorkspace {

    private final TaskContext context;
    private final TextArea area = new TextArea();
    private final VBox view;
    private boolean closed;

    public TextAreaWorkspace(TaskContext context) {
        this.context = context;
        area.setId("editor");
        area.setWrapText(true);
        area.setText(context.startText());
        area.positionCaret(Math.min(context.startCaret(), context.startText().length()));
        area.textProperty().addListener((obs, old, now) -> logChange(old, now));
        VBox.setVgrow(area, Priority.ALWAYS);
        view = new VBox(12, new Label(context.task().title()), area);
        view.setId("testWorkspace");
    }

    private void logChange(String old, String now) {
        int start = 0;
        while (start < old.length() && start < now.length() && old.charAt(start) == now.charAt(start)) {
            start++;
        }
        int oldEnd = old.length();
        int newEnd = now.length();
        while (oldEnd > start && newEnd > start && old.charAt(oldEnd - 1) == now.charAt(newEnd - 1)) {
            oldEnd--;
            newEnd--;
        }
        String task = context.task().id();
        if (oldEnd > start) {
            context.log().record(EventType.TEXT_DELETE, task,
                    Map.of("pos", start, "len", oldEnd - start, "text", old.substring(start, oldEnd), "source", "typing"));
        }
        if (newEnd > start) {
            context.log().record(EventType.TEXT_INSERT, task,
                    Map.of("pos", start, "len", newEnd - start, "text", now.substring(start, newEnd), "source", "typing"));
        }
        context.log().snapshot(task, now, area.getCaretPosition());
    }

    @Override
    public Parent view() {
        return view;
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
    public void setFrozen(boolean frozen) {
        area.setEditable(!frozen);
    }

    @Override
    public void focusEditor() {
        area.requestFocus();
    }

    @Override
    public Map<Tool, ToolUse> toolUse() {
        // every offered tool, unused: this double has no panel
        Map<Tool, ToolUse> use = new java.util.EnumMap<>(Tool.class);
        for (Tool tool : context.tools().offered()) {
            use.put(tool, new ToolUse(0, 0, 0, 0, 0, 0, 0));
        }
        return use;
    }

    /** Whether the text can be changed now (false while frozen). */
    public boolean textEditable() {
        return area.isEditable();
    }

    /** True once the flow closed this workspace. */
    public boolean closed() {
        return closed;
    }

    @Override
    public void close() {
        closed = true;
        context.tools().close();
    }
}
