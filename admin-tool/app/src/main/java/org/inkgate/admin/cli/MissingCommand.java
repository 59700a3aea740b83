package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.collection.MissingReport;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code missing}: who on the roster has no response, per form. */
@Command(name = "missing", description = "Report, per form, who on the roster has no response in the results store.")
final class MissingCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--store", required = true, paramLabel = "STORE", description = "the results store: a SQLite"
            + " file, or a PostgreSQL database (postgresql://host:port/database)", converter = StoreLocationConverter.class)
    StoreLocation location;

    @Option(names = "--store-password-file", paramLabel = "FILE", description = StorePasswordFile.DESCRIPTION)
    Path storePasswordFile;

    @Option(names = "--exam-id", paramLabel = "ID", description = "only this exam (default: every exam in the store)")
    String examId;

    @Override
    public Integer call() throws Exception {
        boolean attention = false;
        StoreLocation at = StorePasswordFile.existing(StorePasswordFile.apply(location, storePasswordFile));
        try (ResultsStore store = Stores.openResultsForReading(at)) {
            List<String> exams = examId != null ? List.of(examId) : store.examIds();
            for (String id : exams) {
                attention |= print(spec.commandLine().getOut(), MissingReport.of(store, id));
            }
        }
        return attention ? InkgateAdmin.ATTENTION : InkgateAdmin.OK;
    }

    /** Prints the report; true when something is missing. */
    static boolean print(PrintWriter w, MissingReport r) {
        w.println("Missing responses in " + TerminalText.value(r.examId()) + " (" + r.rosterSize() + " on the roster):");
        if (r.missingCount() == 0 && r.withoutForm().isEmpty()) {
            w.println("  none: every candidate on the roster has a response to every task of their form.");
            return false;
        }
        r.byForm().forEach((form, list) -> {
            w.println("  form " + TerminalText.value(form) + ": " + (list.isEmpty() ? "none missing" : list.size() + " missing"));
            list.forEach(m -> w.println("    candidate " + TerminalText.value(m.candidateNumber()) + (m.level() == null ? ""
                    : " (level " + TerminalText.value(m.level()) + ")") + (m.taskId() == null ? ": no response package"
                    : ": no response to task " + TerminalText.value(m.taskId()))));
        });
        if (!r.withoutForm().isEmpty()) {
            w.println("  on the roster without a form in the bundle: " + TerminalText.value(r.withoutForm()));
        }
        w.println("  This report cannot tell why a response is missing (absence, a package not yet collected, a");
        w.println("  machine failure). Look for the client's local copy before concluding, and follow your regulations.");
        return true;
    }
}
