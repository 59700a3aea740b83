package org.inkgate.admin.gui.rating;

import java.nio.file.Path;
import javafx.application.Application;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.core.rating.RatingStore;

/**
 * The rating desk as a JavaFX application, started by {@code inkgate-admin rate desk} through
 * {@link #launch(StoreLocation, String)} (the command has checked the store and the exam).
 */
public final class DeskApp extends Application {

    /**
     * The store the desk opens: handed over in this process, not as a launch parameter, because a
     * server location carries its user, TLS settings and password file, which its printed form leaves out.
     */
    private static volatile StoreLocation location;

    private RatingStore store;
    private String failure;

    /** Opens the desk on {@code where} for {@code examId}; returns when the window is closed. */
    public static void launch(StoreLocation where, String examId) {
        location = where;
        Application.launch(DeskApp.class, "--exam=" + examId);
    }

    @Override
    public void init() {
        try {
            StoreLocation where = location != null ? location
                    : StoreLocation.file(Path.of(getParameters().getNamed().get("store")));
            store = Stores.openRating(where, getParameters().getNamed().get("exam"));
        } catch (RatingException e) {
            failure = "The rating desk cannot open: " + e.getMessage() + ". Nothing was changed.";
        }
    }

    @Override
    public void start(Stage stage) {
        if (store == null) {
            Label message = new Label(failure);
            message.setWrapText(true);
            message.setMaxWidth(560);
            stage.setTitle(DeskWindow.TITLE);
            stage.setScene(new Scene(new StackPane(message), 640, 240));
            stage.show();
            return;
        }
        DeskWindow.show(stage, new DeskModel(store), this::closeStore);
    }

    @Override
    public void stop() {
        closeStore();
    }

    private void closeStore() {
        if (store != null) {
            try {
                store.close();
            } catch (RatingException e) {
                // every draft and rating was committed when its call returned; closing only ends the connection
            }
            store = null;
        }
    }
}
