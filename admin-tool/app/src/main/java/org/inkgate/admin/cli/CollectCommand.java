package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.collection.CollectionRun;
import org.inkgate.admin.core.collection.Outcome;
import org.inkgate.admin.core.installations.InstallationList;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.packs.cli.ProgressReporter;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code collect}: imports response packages into the results store and reports what is missing. */
@Command(name = "collect", description = "Import response packages (.inkresp) from folders or files into the results"
        + " store: one transaction per package; safe to rerun. Then report refusals, conflicts and missing responses.")
final class CollectCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "FOLDER", arity = "1..*", description = "folders (searched recursively) or .inkresp files")
    List<Path> roots;

    @Option(names = "--store", required = true, paramLabel = "STORE", description = "the results store: a SQLite file"
            + " (created), or a PostgreSQL database, postgresql://host:port/database (its tables created)",
            converter = StoreLocationConverter.class)
    StoreLocation store;

    @Option(names = "--store-password-file", paramLabel = "FILE", description = StorePasswordFile.DESCRIPTION)
    Path storePasswordFile;

    @Option(names = "--bundle", required = true, paramLabel = "FILE", description = "the bundle(s) of the sitting")
    List<Path> bundleFiles;

    @Option(names = "--keys", required = true, paramLabel = "DIR", description = "the owner key folder")
    Path keys;

    @Option(names = "--passphrase-env", paramLabel = "VAR", description = "environment variable holding the key passphrase")
    String passphraseEnv;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Trust trust;

    /** Which client installations' signatures are accepted. */
    static final class Trust {
        @Option(names = "--installations", paramLabel = "FILE", description = "the installations list: fingerprints of the"
                + " installations enrolled for the sitting, one per line (see installations enrol)")
        Path installations;

        @Option(names = "--any-installation", description = "accept any installation and list each package's"
                + " installation fingerprint for checking against the seat records")
        boolean any;
    }

    @Option(names = "--roster", paramLabel = "CSV", description = "roster CSV: adds levels, first languages and personal"
            + " fields to the store")
    Path roster;

    @Option(names = "--exam", paramLabel = "EXAM_DIR", description = "exam source: adds its rubric to the store")
    Path examSource;

    @Option(names = "--assignment", paramLabel = "CSV", description = "the assignment table the bundle was built with:"
            + " records its seed in the store")
    Path assignment;

    @Option(names = "--threads", paramLabel = "N", description = "packages opened in parallel (default: processors)")
    int threads = Runtime.getRuntime().availableProcessors();

    @Override
    public Integer call() throws Exception {
        PrintWriter w = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        OwnerKeyStore keyStore = new OwnerKeyStore(keys);
        TrustPolicy installations;
        if (trust.any) {
            installations = TrustPolicy.anySigner();
        } else {
            installations = InstallationList.policy(trust.installations);
        }
        ExamSource exam = null;
        char[] pass = Secrets.read(spec, passphraseEnv, "key passphrase", false);
        // the passphrase's key derivation (some tenths of a second) runs beside the reading of the exam source and
        // the bundles; the run takes the key before it opens the store
        CollectionRun.KeySource encryptionKey = unlocking(() -> keyStore.encryptionKey(pass));
        CollectionRun.Report report;
        ProgressReporter[] progress = {null};
        try {
            if (examSource != null) {
                try {
                    exam = ExamSourceReader.read(examSource);
                } catch (InvalidSourceException | RuntimeException e) {
                    encryptionKey.key(); // a wrong passphrase is reported first, as when the key was unlocked first
                    throw e;
                }
            }
            report = CollectionRun.run(new CollectionRun.Request(StorePasswordFile.apply(store, storePasswordFile), bundleFiles, roots, encryptionKey,
                    keyStore.publicKeys().signingFingerprint(), installations, roster, exam, assignment, threads),
                    n -> {
                        w.println("Collecting " + n + " package files into " + store + " ...");
                        w.flush();
                        progress[0] = ProgressReporter.onStandardError(err, "collect", "packages", n);
                    },
                    o -> {
                        if (o instanceof Outcome.Refused r) {
                            progress[0].clear();
                            err.println("REFUSED " + TerminalText.value(r.file()) + " (" + TerminalText.value(r.reason()) + "): "
                                    + TerminalText.value(r.message()));
                            err.flush();
                        }
                        progress[0].step();
                    });
            if (progress[0] != null) {
                progress[0].clear();
            }
        } catch (InvalidSourceException | CollectionRun.BundleRefusedException e) {
            err.println(e.getMessage());
            return InkgateAdmin.PROBLEMS;
        } catch (org.inkgate.admin.core.store.StoreException e) {
            // each package is its own transaction: a failure (a full disk, say) loses only the one in hand
            if (progress[0] != null) {
                progress[0].clear();
            }
            err.println("inkgate-admin collect: " + e.getMessage());
            if (!e.getMessage().endsWith(CollectionRun.NOT_MADE)) {
                err.println("Packages imported before this are kept in the store, whole; the package in hand was not"
                        + " imported. Run the same collect again once this is fixed: it imports only what is not there yet.");
            }
            return InkgateAdmin.PROBLEMS;
        }
        return report(w, report, trust.any);
    }

    /** Starts unlocking on a thread of its own; the source gives the key, or the unlocking's own failure. */
    private static CollectionRun.KeySource unlocking(java.util.concurrent.Callable<java.security.PrivateKey> unlock) {
        java.util.concurrent.FutureTask<java.security.PrivateKey> task = new java.util.concurrent.FutureTask<>(unlock);
        Thread thread = new Thread(task, "inkgate-unlock");
        thread.setDaemon(true);
        thread.start();
        return () -> {
            try {
                return task.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new java.io.IOException("interrupted while unlocking the owner key", e);
            } catch (java.util.concurrent.ExecutionException e) {
                switch (e.getCause()) {
                    case org.inkgate.admin.core.keys.EncryptedKeys.WrongPassphraseException wrong -> throw wrong;
                    case java.io.IOException io -> throw io;
                    case RuntimeException runtime -> throw runtime;
                    case Error error -> throw error;
                    default -> throw new IllegalStateException("unlocking the owner key failed", e.getCause());
                }
            }
        };
    }

    private static int report(PrintWriter w, CollectionRun.Report report, boolean anyInstallation) {
        Map<String, Integer> kinds = report.kinds();
        w.println("Imported " + kinds.getOrDefault("Imported", 0) + ", already imported (same file) "
                + kinds.getOrDefault("AlreadyImported", 0) + ", copies of imported packages "
                + kinds.getOrDefault("SameAsImported", 0) + ", refused " + kinds.getOrDefault("Refused", 0) + ".");
        if (!report.offRoster().isEmpty()) {
            w.println("Imported but NOT on the bundle's roster (kept; check the candidate numbers): "
                    + TerminalText.value(report.offRoster()));
        }
        if (anyInstallation && !report.byInstallation().isEmpty()) {
            w.println("Installations that signed the packages imported now (compare with the seat records):");
            report.byInstallation().forEach((k, v) -> w.println("  " + TerminalText.value(k) + "  " + v + " package"
                    + (v == 1 ? "" : "s")));
        }
        for (var e : report.conflicts().entrySet()) {
            List<Rows.Conflict> conflicts = e.getValue();
            if (!conflicts.isEmpty()) {
                w.println("CONFLICTS in " + TerminalText.value(e.getKey()) + " (more than one response for a candidate and task; all are kept,"
                        + " decide under your regulations which counts):");
                conflicts.forEach(c -> w.println("  candidate " + TerminalText.value(c.candidateNumber()) + ", task "
                        + TerminalText.value(c.taskId()) + ": " + c.copies() + " responses, packages "
                        + TerminalText.value(c.packageIds())));
            }
            MissingCommand.print(w, report.missing().get(e.getKey()));
        }
        return report.needsAttention() ? InkgateAdmin.ATTENTION : InkgateAdmin.OK;
    }
}
