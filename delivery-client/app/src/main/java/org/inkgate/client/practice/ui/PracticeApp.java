package org.inkgate.client.practice.ui;

import java.nio.file.Path;
import javafx.application.Application;
import javafx.stage.Stage;
import org.inkgate.client.practice.PracticeLoad;
import org.inkgate.client.practice.PracticeLoader;

/**
 * The practice window as a JavaFX application. Started by {@link org.inkgate.client.Launcher}
 * (never as a main class itself, which fails on a plain classpath) with the named parameter
 * {@code --bundle=<path>}.
 */
public final class PracticeApp extends Application {

    /** Named parameter holding the path of the bundle to open. */
    public static final String BUNDLE_PARAMETER = "bundle";

    private PracticeLoad load;

    /** Opens the bundle on the launcher thread, before any window exists. */
    @Override
    public void init() {
        String bundle = getParameters().getNamed().get(BUNDLE_PARAMETER);
        load = bundle == null
                ? new PracticeLoad.Refused("No exam bundle was named. Start practice mode through the Inkgate"
                        + " launcher: --practice, or --practice FILE.inkexam.")
                : new PracticeLoader().load(Path.of(bundle));
        if (load instanceof PracticeLoad.Refused refused) {
            System.err.println("Inkgate practice: bundle not opened: " + refused.message());
        }
    }

    @Override
    public void start(Stage stage) {
        PracticeStage.show(stage, load);
    }
}
