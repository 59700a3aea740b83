package org.inkgate.admin.gui;

import javafx.application.Application;
import javafx.stage.Stage;

/** The admin window as a JavaFX application; started by {@link AdminLauncher} or {@code inkgate-admin gui}. */
public final class AdminApp extends Application {

    @Override
    public void start(Stage stage) {
        AdminSession session = new AdminSession();
        session.browser(getHostServices()::showDocument);
        AdminWindow.show(stage, session);
    }
}
