package org.inkgate.admin.gui.preview;

import java.nio.file.Path;
import javafx.application.Application;
import javafx.stage.Stage;
import org.inkgate.client.practice.PracticeLoad;
import org.inkgate.client.practice.PracticeLoader;

/**
 * The preview window as a JavaFX application, started by {@code inkgate-admin preview} with the
 * named parameters {@code --bundle}, {@code --task} and {@code --condition}.
 */
public final class PreviewApp extends Application {

    private PracticeLoad load;

    @Override
    public void init() {
        load = new PracticeLoader().load(Path.of(getParameters().getNamed().get("bundle")));
    }

    @Override
    public void start(Stage stage) {
        PreviewStage.show(stage, load, getParameters().getNamed().get("task"), getParameters().getNamed().get("condition"));
    }
}
