package org.inkgate.admin.gui.bundle;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.bundling.BundleBuilder;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.AssignmentTable;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;
import org.inkgate.format.crypto.Sha256;

/**
 * The bundle step: the same core call as {@code inkgate-admin bundle}, run off the JavaFX thread.
 * A sealed bundle's release code is shown once, until the test owner confirms they stored it.
 */
public final class BundleModel {

    /** A bundle written, with its signer's fingerprint and the file's digest. */
    private record Written(BundleBuilder.Built built, String signer, String sha256) {
    }

    private final AdminSession session;
    private final StringProperty keys = new SimpleStringProperty("");
    private final StringProperty out = new SimpleStringProperty("");
    private final StringProperty passphrase = new SimpleStringProperty("");
    private final StringProperty passphraseAgain = new SimpleStringProperty("");
    private final StringProperty keysResult = new SimpleStringProperty("");
    private final StringProperty pin = new SimpleStringProperty("");
    private final StringProperty pinAgain = new SimpleStringProperty("");
    private final BooleanProperty seal = new SimpleBooleanProperty(false);
    private final StringProperty result = new SimpleStringProperty("");
    private final StringProperty releaseCode = new SimpleStringProperty("");

    public BundleModel(AdminSession session) {
        this.session = session;
        session.exam().addListener((o, was, exam) -> {
            if (exam != null && out.get().isBlank()) {
                out.set(session.besideExam(exam.examId() + ".inkexam").toString());
            }
        });
        Fields.link(keys, session.keys());
    }

    public StringProperty keys() {
        return keys;
    }

    public StringProperty out() {
        return out;
    }

    public StringProperty passphrase() {
        return passphrase;
    }

    /** The passphrase typed again, only for creating new keys. */
    public StringProperty passphraseAgain() {
        return passphraseAgain;
    }

    public StringProperty keysResult() {
        return keysResult;
    }

    /**
     * Creates the owner's key pairs in the key folder (as {@code inkgate-admin keys init}); refuses
     * to overwrite keys that exist.
     */
    public void createKeys() {
        Path keyFolder = Fields.path(keys.get());
        if (keyFolder == null) {
            keysResult.set("Name the folder for the new keys first.");
            return;
        }
        if (!passphrase.get().equals(passphraseAgain.get())) {
            keysResult.set("The two passphrase entries differ. Type the new passphrase twice the same way; no keys were"
                    + " created.");
            return;
        }
        char[] pass = passphrase.get().toCharArray();
        passphrase.set("");
        passphraseAgain.set("");
        session.work().run("Creating keys", progress -> new OwnerKeyStore(keyFolder).init(pass),
                created -> keysResult.set("Keys created in " + keyFolder + ".\nSigning key (Ed25519) fingerprint "
                        + created.signingFingerprint() + "\nEncryption key (X25519) fingerprint "
                        + created.encryptionFingerprint() + "\nPublish the signing fingerprint to invigilators through a"
                        + " channel other than the exam media; keep the passphrase and a backup of the folder safe:"
                        + " without them responses cannot be opened."),
                message -> keysResult.set("No keys were created. " + message));
    }

    public StringProperty pin() {
        return pin;
    }

    public StringProperty pinAgain() {
        return pinAgain;
    }

    public BooleanProperty seal() {
        return seal;
    }

    public StringProperty result() {
        return result;
    }

    /** The release code of the sealed bundle just built; empty when none is shown. */
    public StringProperty releaseCode() {
        return releaseCode;
    }

    /** The test owner has stored the code: it leaves the screen and is kept nowhere. */
    public void releaseCodeStored() {
        releaseCode.set("");
    }

    /** Builds the bundle in the background; the result or a plain message lands in {@link #result()}. */
    public void build() {
        ExamSource exam = session.exam().get();
        releaseCode.set("");
        if (exam == null) {
            result.set("Check the exam folder first (step 1).");
            return;
        }
        Path keyFolder = Fields.path(keys.get());
        Path file = Fields.path(out.get());
        if (keyFolder == null || file == null) {
            result.set("Name the owner key folder and the bundle file to write.");
            return;
        }
        if (!exam.practice() && !pin.get().equals(pinAgain.get())) {
            result.set("The two PIN entries differ. Type the invigilator PIN twice the same way; nothing was built.");
            return;
        }
        if (!exam.practice() && pin.get().isEmpty()) {
            result.set("A live exam needs an invigilator PIN: type it twice. Nothing was built.");
            return;
        }
        Path roster = session.roster().get();
        Path assignment = session.assignment().get();
        if (!exam.practice() && (roster == null || assignment == null)) {
            result.set("A live exam needs its roster and form assignment: assign forms first (step 2).");
            return;
        }
        char[] pass = passphrase.get().toCharArray();
        char[] pinChars = exam.practice() ? null : pin.get().toCharArray();
        boolean sealed = seal.get();
        result.set("Building " + file + " ...");
        session.work().run("Building the bundle", progress -> {
            progress.update(0, 3, "Reading the roster and the assignment ...");
            List<RosterCandidate> candidates = roster == null ? List.of() : RosterReader.read(roster);
            Assignment table = assignment == null ? null : AssignmentTable.read(assignment);
            progress.update(1, 3, "Opening the signing key ...");
            OwnerKeyStore store = new OwnerKeyStore(keyFolder);
            var key = store.signingKey(pass);
            progress.update(2, 3, "Writing and signing " + file.getFileName() + " ...");
            BundleBuilder.Built built = BundleBuilder.build(exam, candidates, table, store.publicKeys().ownerKeys(), key,
                    pinChars, sealed, file);
            progress.update(3, 3, "Done.");
            return new Written(built, store.publicKeys().signingFingerprint(), Sha256.hex(Files.readAllBytes(file)));
        }, done -> {
            BundleBuilder.Built built = done.built();
            session.bundle().set(file);
            result.set("Bundle written: " + file + "\nExam " + built.manifest().examId() + ", "
                    + built.manifest().forms().size() + " forms, " + built.manifest().roster().size() + " candidates, "
                    + built.manifest().packs().size() + " packs.\nSigned by " + done.signer() + "\nFile SHA-256 " + done.sha256()
                    + (built.releaseCode() == null ? "\nNot sealed: prompts are readable by anyone who has the file."
                    : "\nSEALED: the prompts open only with the release code below."));
            if (built.releaseCode() != null) {
                releaseCode.set(new String(built.releaseCode()));
            }
        }, message -> result.set("The bundle was not built.\n" + message));
        passphrase.set("");
        pin.set("");
        pinAgain.set("");
    }
}
