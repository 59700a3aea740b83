package org.inkgate.client.sitting.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Node;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextInputControl;
import javafx.stage.Stage;
import org.inkgate.client.demo.DemoSittingBuild;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.open.SittingBundleOpener;
import org.inkgate.client.sitting.open.SittingLoad;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.trust.TrustPolicy;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/** Drives the sitting flow headless: builds the demo sitting bundle, opens the window, fills screens by node id. */
final class FlowDriver {

    /** The demo owner key's fingerprint, computed from the published demo seed (src/demo/keys). */
    static String demoOwnerKey() throws Exception {
        byte[] seed = Hex.parse(Files.readString(DemoBundles.SOURCE.resolve(
                "keys/demo-only-not-secret-owner-signing.ed25519-seed.hex")).strip());
        return Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(Ed25519.privateFromSeed(seed))));
    }

    /** The demo sitting's published PIN, read from src/demo/sitting.json (DEMO ONLY). */
    static String demoPin() throws Exception {
        return DemoSittingBuild.readSitting(DemoBundles.SOURCE).invigilatorPin();
    }

    /** The console note the demo build writes (PIN, candidate numbers), as the launcher passes it. */
    static String demoNote() {
        try {
            return DemoSittingBuild.note(DemoSittingBuild.readSitting(DemoBundles.SOURCE)).strip();
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    static Path buildDemoSitting(Path folder) throws Exception {
        Path out = folder.resolve("demo-sitting.inkexam");
        DemoSittingBuild.build(DemoBundles.SOURCE, out);
        return out;
    }

    final FxRobot robot;
    final Stage stage;
    final Path data;
    final List<TextAreaWorkspace> workspaces = new ArrayList<>();
    final List<org.inkgate.client.task.TaskWorkspace> realWorkspaces = new ArrayList<>();
    final AtomicBoolean exited = new AtomicBoolean();
    private boolean real;
    SittingFlow flow;

    FlowDriver(FxRobot robot, Stage stage, Path data) {
        this.robot = robot;
        this.stage = stage;
        this.data = data;
    }

    /** Opens the flow on the bundle, trusting the demo key, with the plain-text test workspace. */
    SittingFlow open(Path bundle, SittingClock clock, boolean lock) throws Exception {
        return open(bundle, clock, lock, false, context -> {
            TextAreaWorkspace w = new TextAreaWorkspace(context);
            workspaces.add(w);
            return w;
        });
    }

    /** Opens the flow with the real task workspace (screenshots, demo note shown). */
    SittingFlow openReal(Path bundle, SittingClock clock) throws Exception {
        real = true;
        return open(bundle, clock, false, true, context -> {
            org.inkgate.client.task.TaskWorkspace w = Workspaces.standard().create(context);
            realWorkspaces.add(w);
            return w;
        });
    }

    private SittingFlow open(Path bundle, SittingClock clock, boolean lock, boolean demo, WorkspaceFactory factory)
            throws Exception {
        SittingLoad load = new SittingBundleOpener(Set.of(demoOwnerKey())).open(bundle);
        AtomicReference<SittingFlow> made = new AtomicReference<>();
        robot.interact(() -> {
            SittingFlow f = new SittingFlow(stage, new SittingFlow.Setup(load, bundle, data, factory, clock,
                    demo ? demoNote() : null, lock,
                    () -> exited.set(true)));
            made.set(f);
            f.start();
        });
        flow = made.get();
        return flow;
    }

    /**
     * Releases the lock of the flow this driver opened, if it still holds the stage. A lock left on
     * the stage TestFX shares between test classes keeps taking the screen back for every later
     * class: their window sizes turned into the full screen's. Call after each test that locks.
     */
    void releaseLock() {
        if (flow != null && flow.lock() != null) {
            robot.interact(() -> {
                if (flow.lock().locked()) {
                    flow.lock().release();
                }
            });
        }
    }

    /** Waits until a node with this id is showing. */
    <T extends Node> T await(String id, Class<T> type) {
        try {
            WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> find(id).map(Node::isVisible).orElse(false));
        } catch (java.util.concurrent.TimeoutException e) {
            throw new AssertionError("#" + id + " did not appear within 60 s; screen is " + flow.screen(), e);
        }
        return type.cast(find(id).orElseThrow(() -> new AssertionError("#" + id + " went away again; screen is " + flow.screen())));
    }

    /**
     * Looks a node up on the JavaFX thread. A lookup from the test thread walks the scene while the
     * flow changes it (seen in a whole-module run: IndexOutOfBoundsException inside
     * Parent.lookupAll while the sign-in screen replaced the set-up screen).
     */
    java.util.Optional<Node> find(String id) {
        try {
            return WaitForAsyncUtils.asyncFx(() -> robot.lookup("#" + id).tryQuery()).get(30, TimeUnit.SECONDS);
        } catch (java.util.concurrent.ExecutionException | java.util.concurrent.TimeoutException e) {
            throw new AssertionError("could not look up #" + id + " on the JavaFX thread", e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted while looking up #" + id, e);
        }
    }

    void type(String id, String text) {
        TextInputControl field = await(id, TextInputControl.class);
        robot.interact(() -> field.setText(text));
    }

    void press(String id) {
        Node button = await(id, Node.class);
        robot.interact(() -> ((javafx.scene.control.ButtonBase) button).fire());
        WaitForAsyncUtils.waitForFxEvents();
    }

    void check(String id) {
        CheckBox box = await(id, CheckBox.class);
        robot.interact(() -> box.setSelected(true));
    }

    String text(String id) {
        return await(id, Label.class).getText();
    }

    /** Waits until the label with this id shows text containing {@code part}. */
    void awaitText(String id, String part) {
        try {
            WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> find(id)
                    .map(n -> n instanceof Label l && l.getText().contains(part)).orElse(false));
        } catch (java.util.concurrent.TimeoutException e) {
            throw new AssertionError("#" + id + " never showed \"" + part + "\"; it shows \""
                    + find(id).map(n -> ((Label) n).getText()).orElse("(nothing)") + "\"", e);
        }
    }

    /** Set-up with the demo PIN and an output folder. */
    void setUp(String pin, Path output) {
        type("setupPin", pin);
        type("setupOutput", output.toString());
        press("setupContinue");
    }

    void signIn(String number) {
        type("candidateNumber", number);
        press("signInButton");
    }

    /** The workspace of the task on screen. */
    TextAreaWorkspace workspace() {
        assertTrue(!workspaces.isEmpty(), "no task workspace was made");
        return workspaces.getLast();
    }

    /** Waits for the task screen whose position line contains {@code title}. */
    void awaitTask(String title) {
        awaitText("taskPosition", title);
        await(real ? "answer" : "editor", Node.class);
    }

    /** Types through the robot (real key events, through the lock's filters) into the task's editor. */
    void typeInEditor(String text) {
        robot.interact(() -> (real ? realWorkspaces.getLast() : workspace()).focusEditor());
        robot.write(text);
        WaitForAsyncUtils.waitForFxEvents();
    }

    void finishTask() {
        press("finishTaskButton");
        press("confirmFinishButton");
    }

    /** Opens the invigilator screen as the invigilator does: Ctrl+Shift+F12, then the PIN. */
    void openInvigilator() throws Exception {
        robot.press(javafx.scene.input.KeyCode.CONTROL, javafx.scene.input.KeyCode.SHIFT, javafx.scene.input.KeyCode.F12)
                .release(javafx.scene.input.KeyCode.F12, javafx.scene.input.KeyCode.SHIFT, javafx.scene.input.KeyCode.CONTROL);
        type("pinField", demoPin());
        press("pinOk");
        await("invigilatorPanel", Node.class);
    }

    /** Whether a node with this id is in the scene and showing (its own visibility only). */
    /** Whether node {@code id} lies wholly inside what scroll pane {@code scroller} shows now, without scrolling. */
    boolean inViewOf(String scroller, String id) {
        WaitForAsyncUtils.waitForFxEvents();
        Node pane = find(scroller).orElseThrow(() -> new AssertionError("no #" + scroller));
        Node node = find(id).orElseThrow(() -> new AssertionError("no #" + id));
        try {
            return WaitForAsyncUtils.asyncFx(() -> {
                javafx.geometry.Bounds view = pane.localToScene(pane.getLayoutBounds());
                javafx.geometry.Bounds b = node.localToScene(node.getLayoutBounds());
                return b.getMinY() >= view.getMinY() && b.getMaxY() <= view.getMaxY();
            }).get(30, TimeUnit.SECONDS);
        } catch (Exception e) {
            throw new AssertionError("could not measure #" + id + " in #" + scroller, e);
        }
    }

    boolean showing(String id) {
        WaitForAsyncUtils.waitForFxEvents();
        return find(id).map(Node::isVisible).orElse(false);
    }

    static BundleReader demoReader() throws Exception {
        return new BundleReader(TrustPolicy.trusting(Set.of(demoOwnerKey())));
    }
}
