package org.inkgate.client.sitting.killtest;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.event.Event;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.ButtonBase;
import javafx.scene.control.CheckBox;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.fxmisc.richtext.GenericStyledArea;
import org.inkgate.client.Launcher;

/**
 * The real delivery client ({@link Launcher#main} with the arguments given) plus a test-only
 * typing hook in the same process. This class lives in the test sources, so no build of the
 * client a candidate runs contains the hook. The hook walks the flow to the task the way an
 * invigilator and candidate would (PIN and output folder on set-up, candidate number, begin; on a
 * restart the recovery PIN, with the downtime credit box left unticked), then prints
 * {@code READY} with the editor's text and turns each stdin keystroke line into a key event fired
 * at the focused editor on the JavaFX thread: {@code KEY_TYPED} for a character,
 * {@code KEY_PRESSED}/{@code KEY_RELEASED} of BACK_SPACE for a backspace. The events pass the
 * scene's filters (the lock) and the editor's own key handling, exactly as a keyboard's would.
 *
 * <p>System properties: {@code inkgate.killtest.pin}, {@code inkgate.killtest.output},
 * {@code inkgate.killtest.candidate}.
 */
public final class HookedClient {

    private static final long STEP_MILLIS = 150;

    private HookedClient() {
    }

    public static void main(String[] args) {
        String pin = System.getProperty("inkgate.killtest.pin");
        Path output = Path.of(System.getProperty("inkgate.killtest.output"));
        String candidate = System.getProperty("inkgate.killtest.candidate");
        PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
        Thread.ofPlatform().daemon(true).name("kill-test-typing-hook").start(() -> {
            try {
                hook(pin, output, candidate, out);
            } catch (Exception e) {
                out.println("HOOK-FAILED " + e);
            }
        });
        Launcher.main(args);
    }

    private static void hook(String pin, Path output, String candidate, PrintStream out) throws Exception {
        waitForToolkit();
        Flow flow = new Flow(pin, output, candidate);
        String text = null;
        while (text == null) {
            text = onFx(flow::step).orElse(null);
            if (text == null) {
                Thread.sleep(STEP_MILLIS);
            }
        }
        out.println(TypingProtocol.ready(text));
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8));
        int applied = 0;
        for (String line = in.readLine(); line != null; line = in.readLine()) {
            int key = TypingProtocol.keystroke(line);
            onFx(() -> {
                type(flow.area, key);
                return Optional.empty();
            });
            applied++;
            out.println(TypingProtocol.ACK + applied);
        }
    }

    /** Fires one keystroke at the focused editor (or at the editor, when focus is elsewhere). */
    private static void type(GenericStyledArea<?, ?, ?> area, int key) {
        Scene scene = area.getScene();
        Node target = scene != null && scene.getFocusOwner() != null ? scene.getFocusOwner() : area;
        if (key < 0) {
            Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_PRESSED, KeyEvent.CHAR_UNDEFINED, "", KeyCode.BACK_SPACE,
                    false, false, false, false));
            Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_RELEASED, KeyEvent.CHAR_UNDEFINED, "", KeyCode.BACK_SPACE,
                    false, false, false, false));
        } else {
            Event.fireEvent(target, new KeyEvent(KeyEvent.KEY_TYPED, Character.toString(key), "", KeyCode.UNDEFINED,
                    false, false, false, false));
        }
    }

    /** Walks the screens; returns the editor's text once a task's editor is editable and focused. */
    private static final class Flow {
        final String pin;
        final Path output;
        final String candidate;
        GenericStyledArea<?, ?, ?> area;
        long lastAction;
        /** Buttons already pressed: each is pressed once, as a person would, never again while its screen waits. */
        final java.util.Set<Node> pressed = java.util.Collections.newSetFromMap(new java.util.IdentityHashMap<>());

        Flow(String pin, Path output, String candidate) {
            this.pin = pin;
            this.output = output;
            this.candidate = candidate;
        }

        Optional<String> step() {
            for (Window w : List.copyOf(Window.getWindows())) {
                if (!w.isShowing() || w.getScene() == null) {
                    continue;
                }
                Parent root = w.getScene().getRoot();
                Optional<GenericStyledArea<?, ?, ?>> editor = findArea(root);
                if (editor.isPresent() && shown(editor.get()) && editor.get().isEditable() && !editor.get().isDisabled()) {
                    area = editor.get();
                    if (w instanceof Stage stage) {
                        stage.requestFocus();
                    }
                    area.requestFocus();
                    if (area.isFocused()) {
                        area.moveTo(area.getLength());
                        return Optional.of(area.getText());
                    }
                    return Optional.empty();
                }
                // one action per step and at most one every 0.3 s, so the flow can answer in between
                if (System.nanoTime() - lastAction < TimeUnit.MILLISECONDS.toNanos(300)) {
                    return Optional.empty();
                }
                if (ready(root, "resumeButton") && fill(root, "recoveryPin", pin)) {
                    act(root, "resumeButton");
                } else if (ready(root, "setupContinue") && fill(root, "setupPin", pin)) {
                    fill(root, "setupOutput", output.toString());
                    act(root, "setupContinue");
                } else if (ready(root, "signInButton") && fill(root, "candidateNumber", candidate)) {
                    act(root, "signInButton");
                } else {
                    for (String id : new String[] {"continueButton", "startButton"}) {
                        if (act(root, id)) {
                            break;
                        }
                    }
                }
            }
            return Optional.empty();
        }

        private boolean fill(Parent root, String id, String value) {
            if (root.lookup("#" + id) instanceof TextInputControl field && shown(field) && !field.isDisabled()) {
                field.setText(value);
                return true;
            }
            return false;
        }

        /** Whether the button is showing, enabled and not yet pressed. */
        private boolean ready(Parent root, String id) {
            Node node = root.lookup("#" + id);
            return node instanceof ButtonBase button && !(button instanceof CheckBox) && shown(button) && !button.isDisabled()
                    && !pressed.contains(button);
        }

        private boolean act(Parent root, String id) {
            if (ready(root, id)) {
                ButtonBase button = (ButtonBase) root.lookup("#" + id);
                pressed.add(button);
                button.fire();
                lastAction = System.nanoTime();
                return true;
            }
            return false;
        }
    }

    private static Optional<GenericStyledArea<?, ?, ?>> findArea(Node node) {
        if (node instanceof GenericStyledArea<?, ?, ?> area) {
            return Optional.of(area);
        }
        if (node instanceof Parent parent) {
            for (Node child : new ArrayList<>(parent.getChildrenUnmodifiable())) {
                Optional<GenericStyledArea<?, ?, ?>> found = findArea(child);
                if (found.isPresent()) {
                    return found;
                }
            }
        }
        return Optional.empty();
    }

    private static boolean shown(Node node) {
        for (Node n = node; n != null; n = n.getParent()) {
            if (!n.isVisible()) {
                return false;
            }
        }
        return node.getScene() != null;
    }

    private static <T> T onFx(java.util.function.Supplier<T> work) throws Exception {
        CompletableFuture<T> result = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                result.complete(work.get());
            } catch (RuntimeException | Error e) {
                result.completeExceptionally(e);
            }
        });
        return result.get(60, TimeUnit.SECONDS);
    }

    private static void waitForToolkit() throws InterruptedException {
        while (true) {
            try {
                Platform.runLater(() -> { });
                return;
            } catch (IllegalStateException notYet) {
                Thread.sleep(50);
            }
        }
    }
}
