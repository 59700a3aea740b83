package org.inkgate.admin.gui.collect;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.collection.CollectionRun;
import org.inkgate.admin.core.collection.Outcome;
import org.inkgate.admin.core.installations.InstallationList;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.StoreField;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.format.trust.TrustPolicy;

/** The collect step: {@link CollectionRun} (as {@code inkgate-admin collect} runs it), off the JavaFX thread. */
public final class CollectModel {

    private final AdminSession session;
    private final StringProperty folders = new SimpleStringProperty("");
    private final StringProperty store = new SimpleStringProperty("");
    private final StringProperty bundle = new SimpleStringProperty("");
    private final StringProperty keys = new SimpleStringProperty("");
    private final StringProperty assignment = new SimpleStringProperty("");
    private final StringProperty roster = new SimpleStringProperty("");
    private final StringProperty installations = new SimpleStringProperty("");
    private final BooleanProperty anyInstallation = new SimpleBooleanProperty(false);
    private final StringProperty passphrase = new SimpleStringProperty("");
    private final StringProperty counts = new SimpleStringProperty("");
    private final StringProperty details = new SimpleStringProperty("");
    private final ObservableList<Outcome.Refused> refused = FXCollections.observableArrayList();

    public CollectModel(AdminSession session) {
        this.session = session;
        // step 4 works on its own (a bundle built last week or by the command line) and shares what it names
        Fields.link(bundle, session.bundle());
        Fields.link(keys, session.keys());
        Fields.link(assignment, session.assignment());
        Fields.link(roster, session.roster());
        StoreField.link(store, session.store());
        session.exam().addListener((o, was, exam) -> {
            if (exam != null && store.get().isBlank()) {
                store.set(session.besideExam(ResultsStore.DEFAULT_FILE_NAME).toString());
            }
        });
    }

    /** The sitting's bundle file, as built in step 3 or named here. */
    public StringProperty bundle() {
        return bundle;
    }

    /** The owner key folder. */
    public StringProperty keys() {
        return keys;
    }

    /** The assignment table the bundle was built from (checked against the bundle), or blank. */
    public StringProperty assignment() {
        return assignment;
    }

    /** The roster CSV (levels and personal fields for the store), or blank. */
    public StringProperty roster() {
        return roster;
    }

    /** Folders or .inkresp files, one per line. */
    public StringProperty folders() {
        return folders;
    }

    public StringProperty store() {
        return store;
    }

    /** The password file of a PostgreSQL store, shared by the steps. */
    public StringProperty storePasswordFile() {
        return session.storePasswordFile();
    }

    public StringProperty installations() {
        return installations;
    }

    public BooleanProperty anyInstallation() {
        return anyInstallation;
    }

    public StringProperty passphrase() {
        return passphrase;
    }

    public StringProperty counts() {
        return counts;
    }

    public StringProperty details() {
        return details;
    }

    public ObservableList<Outcome.Refused> refused() {
        return refused;
    }

    /** Collects in the background; counts, refusals and conflicts land in the properties. */
    public void collect() {
        List<Path> roots = Arrays.stream(folders.get().split("\\R")).map(String::strip).filter(s -> !s.isEmpty())
                .map(Path::of).toList();
        Path bundle = Fields.path(this.bundle.get());
        Path keys = Fields.path(this.keys.get());
        Path installationsFile = Fields.path(installations.get());
        refused.clear();
        details.set("");
        if (roots.isEmpty() || store.get().isBlank()) {
            counts.set("Name at least one folder of response packages and the results store (a file, or a postgresql:// address).");
            return;
        }
        StoreLocation storeFile;
        try {
            storeFile = StoreField.location(store.get(), session.storePasswordFile().get());
        } catch (StoreException e) {
            counts.set(e.getMessage());
            return;
        }
        if (bundle == null || keys == null) {
            counts.set("Name the sitting's bundle file and the owner key folder (or build the bundle in step 3).");
            return;
        }
        if (!anyInstallation.get() && installationsFile == null) {
            counts.set("Name the installations list (installations enrol writes it), or tick \"accept any installation\".");
            return;
        }
        boolean any = anyInstallation.get();
        char[] pass = passphrase.get().toCharArray();
        passphrase.set("");
        var exam = session.exam().get();
        Path roster = Fields.path(this.roster.get());
        Path assignment = Fields.path(this.assignment.get());
        counts.set("Collecting ...");
        AtomicLong total = new AtomicLong();
        AtomicLong settled = new AtomicLong();
        session.work().run("Collecting response packages", progress -> {
            OwnerKeyStore keyStore = new OwnerKeyStore(keys);
            TrustPolicy trust;
            if (any) {
                trust = TrustPolicy.anySigner();
            } else {
                trust = InstallationList.policy(installationsFile);
            }
            var encryptionKey = keyStore.encryptionKey(pass);
            return CollectionRun.run(new CollectionRun.Request(storeFile, List.of(bundle), roots, encryptionKey,
                    keyStore.publicKeys().signingFingerprint(), trust, roster, exam, assignment,
                    Runtime.getRuntime().availableProcessors()),
                    n -> {
                        total.set(n);
                        progress.update(0, n, "Found " + n + " package files; importing ...");
                    },
                    o -> progress.update(settled.incrementAndGet(), total.get(), "Settled " + settled.get() + " of "
                            + total.get() + " packages"));
        }, report -> {
            session.store().set(store.get().strip());
            show(report, any);
            if (exam == null) {
                details.set((details.get() + "\nNo rubric was recorded: check the exam folder in step 1 and collect"
                        + " again to add it (nothing is imported twice).").strip());
            }
        }, message -> counts.set("The collection stopped.\n" + message));
    }

    private void show(CollectionRun.Report r, boolean any) {
        counts.set("Imported " + r.count(Outcome.Imported.class) + ", already imported (same file) "
                + r.count(Outcome.AlreadyImported.class) + ", copies of imported packages "
                + r.count(Outcome.SameAsImported.class) + ", refused " + r.count(Outcome.Refused.class) + ".");
        refused.setAll(r.refused());
        StringBuilder b = new StringBuilder();
        if (!r.refused().isEmpty()) {
            b.append("Refused packages changed nothing in the store. Keep each file and its reason; what follows for the"
                    + " candidate is for your regulations to decide.\n");
        }
        if (!r.offRoster().isEmpty()) {
            b.append("Imported but NOT on the bundle's roster (kept; check the candidate numbers): ")
                    .append(r.offRoster()).append('\n');
        }
        if (any && !r.byInstallation().isEmpty()) {
            b.append("Installations that signed the packages imported now (compare with the seat records):\n");
            r.byInstallation().forEach((k, v) -> b.append("  ").append(k).append("  ").append(v).append('\n'));
        }
        r.conflicts().forEach((examId, list) -> {
            if (!list.isEmpty()) {
                b.append("CONFLICTS in ").append(examId).append(" (more than one response for a candidate and task; all"
                        + " are kept, decide under your regulations which counts):\n");
                for (Rows.Conflict c : list) {
                    b.append("  candidate ").append(c.candidateNumber()).append(", task ").append(c.taskId()).append(": ")
                            .append(c.copies()).append(" responses\n");
                }
            }
        });
        r.missing().forEach((examId, m) -> b.append("Missing responses in ").append(examId).append(": ")
                .append(m.missingCount()).append(" (see step 5).\n"));
        details.set(b.toString().strip());
    }
}
