package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.store.StoreContent;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.packs.cli.ProgressReporter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code store copy} and {@code store digest}: a whole results store moved between a file and a server, proven by digests. */
@Command(name = "store", description = "Copy a whole results store (a SQLite file, a PostgreSQL database) into an"
        + " empty one, or print its content digests.", subcommands = {StoreCommand.Copy.class, StoreCommand.Digest.class})
final class StoreCommand extends GroupCommand {

    private static final String STORE = "a SQLite file, or a PostgreSQL database (postgresql://host:port/database)";

    @Command(name = "copy", description = "Copy every table of a results store into an empty store: SQLite to"
            + " PostgreSQL or back, e.g. an offline copy of a server store. The copy is checked table by table by"
            + " content digests (docs/formats.md) and kept only when all agree; the source is not changed.")
    static final class Copy implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Option(names = "--from", required = true, paramLabel = "STORE", description = "the store to copy: " + STORE,
                converter = StoreLocationConverter.class)
        StoreLocation from;

        @Option(names = "--from-password-file", paramLabel = "FILE", description = "for --from: "
                + StorePasswordFile.DESCRIPTION)
        Path fromPasswordFile;

        @Option(names = "--to", required = true, paramLabel = "STORE", description = "the empty store to copy into: a"
                + " new SQLite file (created), or an empty PostgreSQL database (its tables created)",
                converter = StoreLocationConverter.class)
        StoreLocation to;

        @Option(names = "--to-password-file", paramLabel = "FILE", description = "for --to: "
                + StorePasswordFile.DESCRIPTION)
        Path toPasswordFile;

        @Override
        public Integer call() {
            PrintWriter out = spec.commandLine().getOut();
            PrintWriter err = spec.commandLine().getErr();
            StoreLocation source = StorePasswordFile.existing(StorePasswordFile.apply(from, fromPasswordFile));
            StoreLocation target = StorePasswordFile.apply(to, toPasswordFile);
            StoreContent copied;
            try (ProgressReporter progress = ProgressReporter.onStandardError(err, "store copy", "rows", 0)) {
                copied = Stores.copy(source, target, (done, total, table) -> {
                    progress.total(total);
                    progress.stepTo(done, table);
                });
            } catch (StoreException e) {
                err.println("inkgate-admin store copy: " + e.getMessage());
                return InkgateAdmin.PROBLEMS;
            }
            out.println("Copied " + from + " to " + to + " (schema version " + copied.schemaVersion() + ", "
                    + copied.rows() + " rows):");
            print(out, copied);
            out.println("Every table's digest in the copy equals the source's (SHA-256 of the rows, docs/formats.md,"
                    + " \"Store content digests\").");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "digest", description = "Print every table's row count and content digest (docs/formats.md): equal"
            + " digests mean equal contents, whichever database holds the store. Changes nothing.")
    static final class Digest implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Option(names = "--store", required = true, paramLabel = "STORE", description = "the results store: " + STORE,
                converter = StoreLocationConverter.class)
        StoreLocation location;

        @Option(names = "--store-password-file", paramLabel = "FILE", description = StorePasswordFile.DESCRIPTION)
        Path storePasswordFile;

        @Override
        public Integer call() throws StoreException {
            StoreContent content = Stores.content(StorePasswordFile.existing(StorePasswordFile.apply(location,
                    storePasswordFile)));
            PrintWriter out = spec.commandLine().getOut();
            out.println("Contents of " + location + " (schema version " + content.schemaVersion() + ", " + content.rows()
                    + " rows):");
            print(out, content);
            return InkgateAdmin.OK;
        }
    }

    /** One line per table: name, rows, SHA-256. */
    static void print(PrintWriter out, StoreContent content) {
        int width = content.tables().stream().mapToInt(t -> t.name().length()).max().orElse(5);
        out.println(String.format("  %-" + width + "s %10s  %s", "table", "rows", "SHA-256 of the rows"));
        for (StoreContent.Table t : content.tables()) {
            out.println(String.format("  %-" + width + "s %10d  %s", t.name(), t.rows(), t.sha256()));
        }
    }
}
