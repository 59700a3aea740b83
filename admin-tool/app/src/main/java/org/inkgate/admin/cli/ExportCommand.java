package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.export.Cancellation;
import org.inkgate.admin.core.export.StoreExport;
import org.inkgate.admin.core.export.XapiExport;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.packs.cli.ProgressReporter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code export}: tidy CSV, QTI 3.0 results and xAPI statements from the results store. */
@Command(name = "export", description = "Export responses, tool use, process events and questionnaire answers: tidy"
        + " CSV (see docs/data-dictionary.md), QTI 3.0 results per response package (with the scores once ratings"
        + " exist), xAPI statements as JSON lines.")
final class ExportCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--store", required = true, paramLabel = "STORE", description = "the results store: a SQLite"
            + " file, or a PostgreSQL database (postgresql://host:port/database)", converter = StoreLocationConverter.class)
    StoreLocation location;

    @Option(names = "--store-password-file", paramLabel = "FILE", description = StorePasswordFile.DESCRIPTION)
    Path storePasswordFile;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder for the exported files")
    Path out;

    @Option(names = "--exam-id", paramLabel = "ID", description = "only this exam (default: every exam in the store)")
    String examId;

    @Option(names = "--xapi-base", paramLabel = "IRI", description = "IRI base of the xAPI activities, extensions and"
            + " account home page, under a domain you control (default: the placeholder " + XapiExport.BASE + ")")
    String xapiBase = XapiExport.BASE;

    @Option(names = "--xapi-light", description = "leave the per-keystroke statements (text.insert, text.delete) out of"
            + " the xAPI export: tool use, task and sitting boundaries, focus and navigation remain")
    boolean xapiLight;

    @Option(names = "--spreadsheet-safe", description = "write the CSV files for opening in a spreadsheet: a cell that"
            + " starts with = + - @, a tab or a carriage return gets a single quote in front, so it is never run as a"
            + " formula (OWASP, CSV Injection); programs and analyse read the plain export (docs/data-dictionary.md)")
    boolean spreadsheetSafe;

    @Override
    public Integer call() throws Exception {
        PrintWriter w = spec.commandLine().getOut();
        XapiExport.Options xapiOptions = new XapiExport.Options(xapiBase, xapiLight);
        StoreLocation at = StorePasswordFile.existing(StorePasswordFile.apply(location, storePasswordFile));
        try (ResultsStore store = Stores.openResultsForReading(at)) {
            List<String> exams = StoreExport.exams(store, examId);
            List<StoreExport.Written> written;
            // Ctrl+C cancels through the export's own shutdown hook (StagedFolder): nothing is moved into --out
            try (ProgressReporter progress = ProgressReporter.onStandardError(spec.commandLine().getErr(), "export",
                    "steps", StoreExport.steps(exams.size()))) {
                written = StoreExport.write(at, store, exams, out, xapiOptions, spreadsheetSafe, new StoreExport.Progress() {
                    @Override
                    public void step(long done, long total, String what) {
                        progress.stepTo(done, TerminalText.value(what));
                    }

                    @Override
                    public void earlierRunFinished(String note) {
                        w.println(TerminalText.value(note));
                    }
                }, new Cancellation());
            }
            for (StoreExport.Written exam : written) {
                exam.lines().forEach(line -> w.println(TerminalText.value(line)));
            }
        }
        w.println(StoreExport.HANDLING);
        return InkgateAdmin.OK;
    }
}
