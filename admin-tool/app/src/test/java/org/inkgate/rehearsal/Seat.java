package org.inkgate.rehearsal;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import javafx.application.Platform;
import javafx.event.Event;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.ButtonBase;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ListView;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.stage.Stage;
import org.fxmisc.richtext.GenericStyledArea;
import org.inkgate.client.sitting.ui.SittingFlow;
import org.inkgate.client.sitting.ui.Workspaces;
import org.inkgate.client.sitting.open.SittingBundleOpener;
import org.inkgate.client.sitting.open.SittingLoad;
import org.inkgate.client.task.TaskWorkspace;

/**
 * One seat of the rehearsal room: the real sitting window ({@link SittingFlow} with the real task
 * workspace and the lock applied) in its own stage, driven the way a person drives it. Keys are
 * key events fired at the scene's focus owner, so they pass the window's and the lock's filters
 * and the focused control's own handling, as a keyboard's would; buttons are fired (a click);
 * choosing in a list is a selection (arrowing through a list logs nothing in the client either).
 * Fields the invigilator fills at set-up are set directly, as the client's own flow tests do.
 */
final class Seat implements AutoCloseable {

    private static final long WAIT_SECONDS = 180;

    final ScriptedClock clock;
    final List<TaskWorkspace> workspaces = new CopyOnWriteArrayList<>();
    private Stage stage;
    private SittingFlow flow;

    Seat(ScriptedClock clock) {
        this.clock = clock;
    }

    /** Opens the sitting window on the bundle, trusting only the owner's signing key. */
    void open(Path bundle, Path dataFolder, String ownerFingerprint) throws Exception {
        SittingLoad load = new SittingBundleOpener(Set.of(ownerFingerprint)).open(bundle);
        onFx(() -> {
            stage = new Stage();
            flow = new SittingFlow(stage, new SittingFlow.Setup(load, bundle, dataFolder, context -> {
                TaskWorkspace w = Workspaces.standard().create(context);
                workspaces.add(w);
                return w;
            }, clock, null, true, () -> { }));
            flow.start();
            return null;
        });
    }

    // ---- screens

    void fill(String id, String value) {
        TextInputControl field = await(id, TextInputControl.class);
        onFx(() -> {
            field.setText(value);
            return null;
        });
    }

    void press(String id) {
        ButtonBase button = await(id, ButtonBase.class);
        waitUntil("#" + id + " enabled", () -> !button.isDisabled());
        onFx(() -> {
            if (button instanceof CheckBox box) {
                box.setSelected(true);
            } else {
                button.fire();
            }
            return null;
        });
    }

    /** Waits for the task's editor to be shown, editable and focused (the flow puts the caret there). */
    void awaitTask(int workspaceCount) {
        waitUntil("task " + workspaceCount + "'s editor focused", () -> {
            if (workspaces.size() < workspaceCount || stage.getScene() == null) {
                return false;
            }
            Node owner = stage.getScene().getFocusOwner();
            return owner instanceof GenericStyledArea<?, ?, ?> area && "answer".equals(owner.getId()) && area.isEditable();
        });
    }

    String answerText() {
        return onFx(() -> workspaces.getLast().text());
    }

    // ---- keys

    /** Types each character as one key event at the focus owner, the clock moving {@code msPerChar} before each. */
    void type(String text, long msPerChar) {
        text.codePoints().forEach(cp -> {
            clock.advanceMillis(msPerChar);
            onFx(() -> {
                fireTyped(cp);
                return null;
            });
        });
    }

    /**
     * Types a whole word and Enter within one turn of the JavaFX thread: the glossary searches as
     * one types after a pause measured in real time, which a loaded test machine could otherwise
     * reach between two characters and log a half-typed query a person typing at speed never would.
     */
    void typeAndEnter(String text) {
        onFx(() -> {
            text.codePoints().forEach(this::fireTyped);
            firePressed(KeyCode.ENTER, false, false);
            return null;
        });
    }

    void key(KeyCode code) {
        onFx(() -> {
            firePressed(code, false, false);
            return null;
        });
    }

    /** Ctrl+Shift+{@code code} (the shortcut key is Ctrl on Linux, where the rehearsal runs). */
    void shortcut(KeyCode code) {
        onFx(() -> {
            firePressed(code, true, true);
            return null;
        });
    }

    private void fireTyped(int cp) {
        Event.fireEvent(focusOwner(), new KeyEvent(KeyEvent.KEY_TYPED, Character.toString(cp), "", KeyCode.UNDEFINED,
                false, false, false, false));
    }

    private void firePressed(KeyCode code, boolean shift, boolean control) {
        Node target = focusOwner();
        Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_PRESSED, KeyEvent.CHAR_UNDEFINED, "", code, shift, control,
                false, false));
        Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_RELEASED, KeyEvent.CHAR_UNDEFINED, "", code, shift, control,
                false, false));
    }

    private Node focusOwner() {
        Scene scene = stage.getScene();
        Node owner = scene.getFocusOwner();
        if (owner == null) {
            throw new AssertionError("nothing has the keyboard focus on screen " + flow);
        }
        return owner;
    }

    /** Moves the keyboard focus to a control (as Tab or a click on it would). */
    void focus(String id) {
        Node node = await(id, Node.class);
        onFx(() -> {
            node.requestFocus();
            return null;
        });
        waitUntil("#" + id + " focused", node::isFocused);
    }

    /** Selects the list item whose text form equals {@code text}. */
    void select(String listId, Object wanted) {
        ListView<?> list = await(listId, ListView.class);
        waitUntil("\"" + wanted + "\" in #" + listId, () -> list.getItems().stream().anyMatch(i -> i.toString().equals(wanted.toString())));
        onFx(() -> {
            for (int i = 0; i < list.getItems().size(); i++) {
                if (list.getItems().get(i).toString().equals(wanted.toString())) {
                    list.getSelectionModel().clearAndSelect(i);
                    list.scrollTo(i);
                }
            }
            return null;
        });
    }

    /** Selects the first item of a list matching the test. */
    <T> void selectWhere(String listId, java.util.function.Predicate<Object> test, String what) {
        ListView<?> list = await(listId, ListView.class);
        waitUntil(what + " in #" + listId, () -> list.getItems().stream().anyMatch(test));
        onFx(() -> {
            for (int i = 0; i < list.getItems().size(); i++) {
                if (test.test(list.getItems().get(i))) {
                    list.getSelectionModel().clearAndSelect(i);
                    return null;
                }
            }
            return null;
        });
    }

    List<Object> items(String listId) {
        ListView<?> list = await(listId, ListView.class);
        return onFx(() -> new ArrayList<Object>(list.getItems()));
    }

    String textOf(String id) {
        Node n = await(id, Node.class);
        return onFx(() -> n instanceof javafx.scene.control.Labeled l ? l.getText()
                : n instanceof TextInputControl t ? t.getText() : String.valueOf(n));
    }

    /** The answer text between two positions (the flagged word of a spelling flag). */
    String answerBetween(int start, int end) {
        return onFx(() -> {
            GenericStyledArea<?, ?, ?> area = (GenericStyledArea<?, ?, ?>) find("answer").orElseThrow();
            return area.getText(start, Math.min(end, area.getLength()));
        });
    }

    // ---- waiting

    <T extends Node> T await(String id, Class<T> type) {
        waitUntil("#" + id + " shown", () -> find(id).filter(type::isInstance).isPresent());
        return type.cast(onFx(() -> find(id).orElseThrow()));
    }

    boolean showing(String id) {
        return onFx(() -> find(id).isPresent());
    }

    /** A showing node with this id in the seat's window (popups of other windows are not searched). */
    private Optional<Node> find(String id) {
        if (stage == null || stage.getScene() == null) {
            return Optional.empty();
        }
        return stage.getScene().getRoot().lookupAll("#" + id).stream().filter(Seat::shown).findFirst();
    }

    private static boolean shown(Node node) {
        for (Node n = node; n != null; n = n.getParent()) {
            if (!n.isVisible()) {
                return false;
            }
        }
        return node.getScene() != null;
    }

    void waitUntil(String what, Supplier<Boolean> onFxCondition) {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(WAIT_SECONDS);
        while (true) {
            if (Boolean.TRUE.equals(onFx(onFxCondition))) {
                return;
            }
            if (System.nanoTime() > end) {
                throw new AssertionError("waited " + WAIT_SECONDS + " s for " + what + "; the window shows: " + describe());
            }
            try {
                Thread.sleep(40);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new AssertionError(e);
            }
        }
    }

    private String describe() {
        return onFx(() -> {
            if (stage == null || stage.getScene() == null) {
                return "(nothing)";
            }
            List<String> ids = new ArrayList<>();
            collectIds(stage.getScene().getRoot(), ids);
            return ids.toString();
        });
    }

    private static void collectIds(Node node, List<String> ids) {
        if (node.getId() != null && shown(node)) {
            String text = node instanceof javafx.scene.control.Labeled l ? l.getText()
                    : node instanceof TextInputControl t ? t.getText() : null;
            ids.add(text == null || text.isEmpty() ? node.getId() : node.getId() + "=\"" + text + "\"");
        }
        if (node instanceof Parent p) {
            for (Node c : p.getChildrenUnmodifiable()) {
                collectIds(c, ids);
            }
        }
    }

    static <T> T onFx(Supplier<T> work) {
        if (Platform.isFxApplicationThread()) {
            return work.get();
        }
        CompletableFuture<T> result = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                result.complete(work.get());
            } catch (Throwable e) {
                result.completeExceptionally(e);
            }
        });
        try {
            return result.get(WAIT_SECONDS, TimeUnit.SECONDS);
        } catch (java.util.concurrent.ExecutionException e) {
            if (e.getCause() instanceof AssertionError a) {
                throw a;
            }
            throw new AssertionError(e.getCause());
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }

    @Override
    public void close() {
        if (flow != null) {
            onFx(() -> {
                flow.closeQuietly();
                stage.close();
                return null;
            });
        }
    }
}
