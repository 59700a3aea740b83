package org.inkgate.client.sitting.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.stage.Stage;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.ToolUse;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Found by the rehearsal (issue 14): after a crash the task's workspace started a fresh tool
 * tally, so the response's tool use held only what the candidate did after the restart although
 * the log kept every use. The real flow and the real workspace, on the demo sitting bundle: one
 * suggestion shown and accepted before a crash, one more after the recovery, and the package's
 * tool use must hold both, as the package's own events do.
 */
@ExtendWith(ApplicationExtension.class)
class ToolUseAcrossRecoveryTest {

    @TempDir
    Path temp;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void toolUse_taskInterruptedByACrash_countsTheUseOfBothProcesses(FxRobot robot) throws Exception {
        Path bundle = FlowDriver.buildDemoSitting(temp);
        Path out = temp.resolve("out");
        ManualClock clock = new ManualClock();
        FlowDriver first = new FlowDriver(robot, stage, temp.resolve("data"));
        first.openReal(bundle, clock);
        first.setUp(FlowDriver.demoPin(), out);
        // D1002 sits form B: mill-street-shop first, with spelling suggestions (src/demo/sitting.json, exam.json)
        first.signIn("D1002");
        first.press("startButton");
        first.awaitTask("The empty shop on Mill Street");
        first.typeInEditor("The shopp is empty. ");
        acceptFirstSuggestion(first, robot);
        // the log is durable within 0.5 s; wait well past that, then drop the window as a crash would
        WaitForAsyncUtils.sleep(1500, TimeUnit.MILLISECONDS);
        robot.interact(() -> first.flow.closeQuietly());

        FlowDriver second = new FlowDriver(robot, stage, temp.resolve("data"));
        second.openReal(bundle, clock);
        second.await("recoveryScreen", Node.class);
        second.type("recoveryOutput", out.toString());
        second.type("recoveryPin", FlowDriver.demoPin());
        second.press("resumeButton");
        second.press("continueButton");
        second.awaitTask("The empty shop on Mill Street");
        second.typeInEditor(" It needs a cafee.");
        acceptFirstSuggestion(second, robot);
        second.finishTask();
        second.awaitTask("A note to a neighbour");
        second.finishTask();
        second.press("questionnaireDone");
        second.check("confirmCheck");
        second.press("submitButton");
        second.await("finishedScreen", Node.class);

        Path pkg;
        try (Stream<Path> files = Files.list(out)) {
            pkg = files.filter(p -> p.toString().endsWith(".inkresp")).findFirst().orElseThrow();
        }
        OpenedResponse opened = new ResponsePackageReader(demoOwnerPrivateKey(), TrustPolicy.anySigner()).open(pkg);
        TaskResponse shop = opened.response().tasks().stream().filter(t -> t.taskId().equals("mill-street-shop"))
                .findFirst().orElseThrow();
        ToolUse spelling = shop.toolUse().get(Tool.SPELLING);
        // the script: one suggestion shown and accepted in each process
        assertEquals(2, spelling.suggestionsShown(), "suggestions shown over both processes: " + spelling);
        assertEquals(2, spelling.suggestionsAccepted(), "suggestions accepted over both processes: " + spelling);
        // and the summary agrees with the package's own events
        assertEquals(logged(opened, EventType.SUGGESTION_SHOW), spelling.suggestionsShown());
        assertEquals(logged(opened, EventType.SUGGESTION_ACCEPT), spelling.suggestionsAccepted());
    }

    /** Opens the spelling page's first marked word and uses its first suggestion, as a candidate would. */
    private static void acceptFirstSuggestion(FlowDriver d, FxRobot robot) throws Exception {
        @SuppressWarnings("unchecked")
        ListView<Object> flags = d.await("flagList", ListView.class);
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> !flags.getItems().isEmpty());
        int marked = flags.getItems().size();
        robot.interact(() -> {
            flags.getSelectionModel().selectFirst();
            flags.fireEvent(new KeyEvent(KeyEvent.KEY_PRESSED, "", "", KeyCode.ENTER, false, false, false, false));
        });
        Button use = d.await("useSuggestion", Button.class);
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> !use.isDisabled());
        robot.interact(use::fire);
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> flags.getItems().size() < marked);
    }

    private static long logged(OpenedResponse opened, EventType type) {
        return opened.events().stream().filter(e -> "mill-street-shop".equals(e.task()) && e.type().equals(type.wireName()))
                .count();
    }

    private static java.security.PrivateKey demoOwnerPrivateKey() throws Exception {
        return X25519.privateFromRaw(Hex.parse(Files.readString(DemoBundles.SOURCE.resolve(
                "keys/demo-only-not-secret-owner-encryption.x25519.hex")).strip()));
    }
}
