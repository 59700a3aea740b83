package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.gui.rating.DeskApp;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code rate desk}: opens the rating desk window over the results store, where raters sign in
 * and score their queues blind. Checks the store first, so a wrong path or an exam without raters
 * is reported here, with exit code 1, before any window opens.
 */
@Command(name = "desk", mixinStandardHelpOptions = true,
        description = "Open the rating desk: a rater chooses their rater id and scores their queue, blind. There is no"
                + " password; follow the test owner's rules on who may sign in.")
final class DeskCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    RateCommand.StoreOptions storeOptions;

    @Option(names = "--no-window", description = "check the store and list each rater's queue; open no window")
    boolean noWindow;

    @Override
    public Integer call() throws org.inkgate.admin.core.store.StoreException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        String examId;
        try (RatingStore s = storeOptions.open()) {
            examId = s.examId();
            List<RatingDesk.Rater> raters = s.raters();
            if (raters.isEmpty()) {
                err.println("inkgate-admin rate desk: exam " + examId + " has no raters yet. Add them (rate raters add) and"
                        + " assign the responses (rate assign) before rating starts. No window was opened.");
                return InkgateAdmin.PROBLEMS;
            }
            out.println("Rating desk for exam " + examId + " in " + storeOptions.store + ":");
            for (RatingDesk.Rater r : raters) {
                RatingDesk.Progress p = s.progress(r.id());
                out.println("  " + r.id() + ": " + p.total() + " in the queue, " + p.rated() + " rated, " + p.remaining()
                        + " remaining, " + p.flagged() + " flagged");
            }
        } catch (RatingException e) {
            err.println("inkgate-admin rate desk: " + e.getMessage() + ". No window was opened.");
            return InkgateAdmin.PROBLEMS;
        }
        if (noWindow) {
            out.flush();
            return InkgateAdmin.OK;
        }
        out.println("Opening the rating desk; close the window to finish (every change is already stored as a draft).");
        out.flush();
        StoreLocation at;
        try {
            at = storeOptions.location();
        } catch (RatingException e) {
            err.println("inkgate-admin rate desk: " + e.getMessage() + ". No window was opened.");
            return InkgateAdmin.PROBLEMS;
        }
        DeskApp.launch(at instanceof StoreLocation.File f ? StoreLocation.file(f.path().toAbsolutePath()) : at, examId);
        return InkgateAdmin.OK;
    }
}
