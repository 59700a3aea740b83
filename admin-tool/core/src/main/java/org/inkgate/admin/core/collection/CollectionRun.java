package org.inkgate.admin.core.collection;

import java.io.IOException;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.Consumer;
import java.util.function.IntConsumer;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.AssignmentTable;
import org.inkgate.admin.core.keys.EncryptedKeys;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.trust.TrustPolicy;

/**
 * One whole collection, as the command line and the admin window run it: registers the sitting's
 * bundles (signed by the owner), the roster, rubric and assignment seed in the results store,
 * imports the packages found, and reports outcomes, conflicts and missing responses per exam.
 */
public final class CollectionRun {

    /**
     * What to collect.
     *
     * @param ownerSigningFingerprint the owner's signing key fingerprint: bundles must be signed by it
     * @param installations           whose package signatures are accepted
     * @param roster                  roster CSV, or null
     * @param exam                    exam source (adds its rubric), or null
     * @param assignment              assignment table (records its seed), or null
     */
    public record Request(StoreLocation store, List<Path> bundleFiles, List<Path> roots, KeySource encryptionKey,
            String ownerSigningFingerprint, TrustPolicy installations, Path roster, ExamSource exam, Path assignment,
            int threads) {
        public Request {
            bundleFiles = List.copyOf(bundleFiles);
            roots = List.copyOf(roots);
        }

        /** With the owner's decryption key already unlocked. */
        public Request(StoreLocation store, List<Path> bundleFiles, List<Path> roots, PrivateKey encryptionKey,
                String ownerSigningFingerprint, TrustPolicy installations, Path roster, ExamSource exam, Path assignment,
                int threads) {
            this(store, bundleFiles, roots, () -> encryptionKey, ownerSigningFingerprint, installations, roster, exam,
                    assignment, threads);
        }

        /** Into the SQLite store in {@code storeFile}. */
        public Request(Path storeFile, List<Path> bundleFiles, List<Path> roots, PrivateKey encryptionKey,
                String ownerSigningFingerprint, TrustPolicy installations, Path roster, ExamSource exam, Path assignment,
                int threads) {
            this(StoreLocation.file(storeFile), bundleFiles, roots, encryptionKey, ownerSigningFingerprint, installations,
                    roster, exam, assignment, threads);
        }
    }

    /**
     * What the collection found.
     *
     * @param outcomes       one per package file, in file order
     * @param offRoster      imported packages of candidates not on the bundle's roster
     * @param byInstallation packages imported now per signing installation fingerprint
     * @param conflicts      per exam id: candidates with more than one response to a task
     * @param missing        per exam id: who on the roster has no response
     */
    public record Report(List<Outcome> outcomes, List<String> offRoster, Map<String, Integer> byInstallation,
            Map<String, List<Rows.Conflict>> conflicts, Map<String, MissingReport> missing) {

        /** Outcomes counted by kind (the simple class name: Imported, AlreadyImported, SameAsImported, Refused). */
        public Map<String, Integer> kinds() {
            Map<String, Integer> kinds = new TreeMap<>();
            outcomes.forEach(o -> kinds.merge(o.getClass().getSimpleName(), 1, Integer::sum));
            return kinds;
        }

        public int count(Class<? extends Outcome> kind) {
            return kinds().getOrDefault(kind.getSimpleName(), 0);
        }

        public List<Outcome.Refused> refused() {
            return outcomes.stream().filter(Outcome.Refused.class::isInstance).map(Outcome.Refused.class::cast).toList();
        }

        /** True when a person should look: a refusal, a conflict, an off-roster or a missing response. */
        public boolean needsAttention() {
            return !refused().isEmpty() || !offRoster.isEmpty() || conflicts.values().stream().anyMatch(l -> !l.isEmpty())
                    || missing.values().stream().anyMatch(m -> m.missingCount() > 0 || !m.withoutForm().isEmpty());
        }
    }

    /**
     * The owner's decryption key, which may still be being unlocked from its passphrase (a key derivation of some
     * tenths of a second, docs/benchmarks.md, issue 16): a run reads and checks its bundles meanwhile and takes the
     * key before it opens the store, so a wrong passphrase still changes nothing.
     */
    @FunctionalInterface
    public interface KeySource {
        PrivateKey key() throws IOException, EncryptedKeys.WrongPassphraseException;
    }

    /** A bundle named for the collection was refused; nothing was imported. */
    public static final class BundleRefusedException extends Exception {
        private static final long serialVersionUID = 1L;

        BundleRefusedException(Path file, FormatRefusal refusal) {
            super("The bundle " + file + " is refused: " + refusal.getMessage());
        }
    }

    private CollectionRun() {
    }

    /** The bundles of a run, checked, with what the store records of them, and the assignment table if named. */
    private record Bundles(Map<String, BundleManifest> manifests, Map<String, String> signers,
            Map<String, Map<String, String>> prompts, Assignment assignment) {
    }

    private static Bundles readBundles(Request r) throws IOException, InvalidSourceException, BundleRefusedException {
        Map<String, BundleManifest> bundles = new HashMap<>();
        TrustPolicy owner = TrustPolicy.trusting(Set.of(r.ownerSigningFingerprint()));
        Map<String, String> signers = new HashMap<>();
        Map<String, Map<String, String>> prompts = new HashMap<>();
        for (Path f : r.bundleFiles()) {
            try (OpenedBundle b = new BundleReader(owner).open(f)) {
                bundles.put(b.manifestSha256(), b.manifest());
                signers.put(b.manifestSha256(), b.signerFingerprint());
                if (b.readable()) {
                    // a sealed bundle's prompts stay closed here; --exam supplies them (below)
                    Map<String, String> byTask = prompts.computeIfAbsent(b.manifest().examId(), k -> new HashMap<>());
                    for (var t : b.manifest().tasks()) {
                        byTask.put(t.id(), b.readText(t.promptFile()));
                    }
                }
            } catch (FormatRefusal refusal) {
                throw new BundleRefusedException(f, refusal);
            }
        }
        Assignment assignment = r.assignment() == null ? null : AssignmentTable.read(r.assignment());
        if (assignment != null) {
            // before anything is written: a table other than the bundle's would record the wrong forms and seed
            for (BundleManifest m : bundles.values()) {
                List<Problem> wrong = AssignmentTable.mismatches(assignment, r.assignment(), m.roster());
                if (!wrong.isEmpty()) {
                    throw new InvalidSourceException("the assignment " + r.assignment() + " is not the one the bundle"
                            + " of " + m.examId() + " was built from (nothing was collected; name the table the bundle"
                            + " was built with)", wrong);
                }
            }
        }
        return new Bundles(bundles, signers, prompts, assignment);
    }

    /**
     * Runs the collection. {@code starting} hears the number of package files found, {@code settled}
     * each outcome as it is settled (on the calling thread).
     */
    public static Report run(Request r, IntConsumer starting, Consumer<Outcome> settled)
            throws IOException, InvalidSourceException, BundleRefusedException, org.inkgate.admin.core.store.StoreException,
            EncryptedKeys.WrongPassphraseException {
        // the bundles and the assignment table are read and checked before the store is opened: a refusal leaves
        // no store behind, and the key may be unlocked meanwhile
        Bundles b;
        try {
            b = readBundles(r);
        } catch (IOException | InvalidSourceException | BundleRefusedException | RuntimeException e) {
            r.encryptionKey().key(); // a wrong passphrase is reported first, as when the key was unlocked before all else
            throw e;
        }
        PrivateKey encryptionKey = r.encryptionKey().key();
        try {
            return collectInto(r, b, encryptionKey, starting, settled);
        } catch (org.inkgate.admin.core.store.StoreException e) {
            // a new store file is built aside and named only when the run is done (Stores.openResultsToCollect)
            if (r.store() instanceof StoreLocation.File f
                    && !java.nio.file.Files.exists(f.path(), java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                throw new org.inkgate.admin.core.store.StoreException(e.getMessage() + ". " + NOT_MADE, e);
            }
            throw e;
        }
    }

    /** Said when a run into a new store file fails: the side file it was built in is gone, the name never given. */
    public static final String NOT_MADE = "No store was made: a new store gets its name only when its whole collect is"
            + " done, and nothing is lost (the packages are where they were); run the same collect again once this is fixed";

    private static Report collectInto(Request r, Bundles b, PrivateKey encryptionKey, IntConsumer starting,
            Consumer<Outcome> settled) throws IOException, InvalidSourceException, org.inkgate.admin.core.store.StoreException {
        Map<String, BundleManifest> bundles = b.manifests();
        Map<String, String> signers = b.signers();
        Map<String, Map<String, String>> prompts = b.prompts();
        Assignment assignment = b.assignment();
        // a store file takes one collect at a time (the lock beside it); a server store takes many at once,
        // its unique keys storing each package once (docs/formats.md)
        try (CollectLock lock = r.store() instanceof StoreLocation.File f ? CollectLock.acquire(f.path()) : null;
                ResultsStore store = Stores.openResultsToCollect(r.store())) {
            for (var e : bundles.entrySet()) {
                store.registerBundle(e.getValue(), e.getKey(), signers.get(e.getKey()));
            }
            List<String> examIds = bundles.values().stream().map(BundleManifest::examId).distinct().sorted().toList();
            if (r.roster() != null) {
                var candidates = RosterReader.read(r.roster());
                for (String examId : examIds) {
                    store.registerRoster(examId, candidates);
                }
            }
            if (r.exam() != null && examIds.contains(r.exam().examId())) {
                Map<String, String> byTask = prompts.computeIfAbsent(r.exam().examId(), k -> new HashMap<>());
                for (ExamSource.Task t : r.exam().tasks()) {
                    byTask.putIfAbsent(t.id(), java.nio.file.Files.readString(r.exam().folder().resolve(t.promptFile())));
                }
            }
            for (var e : prompts.entrySet()) {
                store.registerPrompts(e.getKey(), e.getValue());
            }
            if (r.exam() != null && r.exam().rubric() != null) {
                store.registerRubric(r.exam().examId(), r.exam().rubric());
            }
            if (assignment != null) {
                long seed = assignment.seed();
                for (BundleManifest m : bundles.values()) {
                    store.recordAssignmentRun(m.examId(), seed, "assignment table " + r.assignment().getFileName());
                }
            }
            List<Path> files = Collector.packageFiles(r.roots());
            starting.accept(files.size());
            Collector collector = new Collector(store, encryptionKey, r.installations(), bundles, r.threads());
            List<Outcome> outcomes = collector.collect(files, settled);
            List<String> offRoster = new ArrayList<>();
            Map<String, Integer> byInstallation = new TreeMap<>();
            for (Outcome o : outcomes) {
                if (o instanceof Outcome.Imported i) {
                    byInstallation.merge(i.installation(), 1, Integer::sum);
                    if (!i.onRoster()) {
                        offRoster.add(i.candidateNumber() + " (" + i.file() + ")");
                    }
                }
            }
            Map<String, List<Rows.Conflict>> conflicts = new LinkedHashMap<>();
            Map<String, MissingReport> missing = new LinkedHashMap<>();
            for (String examId : examIds) {
                conflicts.put(examId, store.conflicts(examId));
                missing.put(examId, MissingReport.of(store, examId));
            }
            store.keep();
            return new Report(outcomes, offRoster, byInstallation, conflicts, missing);
        }
    }
}
