package org.inkgate.admin.cli;

import java.util.concurrent.Callable;
import javafx.application.Application;
import org.inkgate.admin.gui.AdminApp;
import picocli.CommandLine.Command;

/** {@code gui}: opens the admin window, the same steps as the commands over the same services. */
@Command(name = "gui", description = "Open the admin window: exam check, forms, bundle, collect, missing responses, rating desk.")
final class GuiCommand implements Callable<Integer> {

    @Override
    public Integer call() {
        Application.launch(AdminApp.class);
        return InkgateAdmin.OK;
    }
}
