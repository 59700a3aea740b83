package org.inkgate.admin.gui;

import javafx.application.Application;

/**
 * Starts the admin window. A plain class on purpose: a main class that extends Application fails
 * on a plain classpath ("JavaFX runtime components are missing").
 */
public final class AdminLauncher {

    private AdminLauncher() {
    }

    public static void main(String[] args) {
        Application.launch(AdminApp.class, args);
    }
}
