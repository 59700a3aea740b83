package org.inkgate.admin.gui.rating;

import java.nio.file.Path;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.testfx.api.FxRobot;
import org.testfx.api.FxToolkit;

/**
 * A rater at the real desk window in its own process, for {@link DeskKilledTest}: signs in as the
 * first rater, scores and submits the first response by keyboard, starts the second (one score), then
 * types a comment letter by letter, printing "KEPT n" each time the desk has stored the draft with n
 * letters. It never closes anything: the test kills it. Arguments: store file, exam id, comment.
 */
public final class DeskKillProcess {

    private DeskKillProcess() {
    }

    public static void main(String[] args) throws Exception {
        Stage stage = FxToolkit.registerPrimaryStage();
        RatingStore store = StoreFixture.of(Path.of(args[0])).rating(args[1]);
        DeskModel model = new DeskModel(store);
        FxRobot robot = new FxRobot();
        robot.interact(() -> DeskWindow.show(stage, model));
        DeskShots.settle(model);
        robot.type(KeyCode.ENTER);
        DeskShots.settle(model);
        String first = model.current().get().blindId();
        robot.write("6").type(KeyCode.ENTER).write("5");
        robot.press(KeyCode.CONTROL).type(KeyCode.ENTER).release(KeyCode.CONTROL);
        DeskShots.settle(model);
        String second = model.current().get().blindId();
        robot.write("7").type(KeyCode.ENTER).type(KeyCode.ENTER);
        DeskShots.settle(model);
        System.out.println("OPEN " + model.rater().get().id() + " " + first + " " + second);
        System.out.flush();
        String comment = args[2];
        for (int i = 0; i < comment.length(); i++) {
            robot.write(comment.charAt(i));
            DeskShots.settle(model);
            System.out.println("KEPT " + (i + 1));
            System.out.flush();
        }
        Thread.sleep(120_000);
    }
}
