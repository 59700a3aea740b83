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
 * The rating desk as a JavaFX application, started by {@code inkgate-admin rate desk} with the
 * named parameters {@code --store} and {@code --exam} (the command has checked both).
 */
public final class DeskApp extends Application {

    private RatingStore store;
    private String failure;

    @Override
    public void init() {
        try {
            store = Stores.openRating(StoreLocation.file(Path.of(getParameters().getNamed().get("store"))), getParameters().getNamed().get("exam"));
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
