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
import org.inkgate.admin.core.forms.AssignmentTable;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.SqliteResultsStore;
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
    public record Request(Path storeFile, List<Path> bundleFiles, List<Path> roots, PrivateKey encryptionKey,
            String ownerSigningFingerprint, TrustPolicy installations, Path roster, ExamSource exam, Path assignment,
            int threads) {
        public Request {
            bundleFiles = List.copyOf(bundleFiles);
            roots = List.copyOf(roots);
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

    /** A bundle named for the collection was refused; nothing was imported. */
    public static final class BundleRefusedException extends Exception {
        private static final long serialVersionUID = 1L;

        BundleRefusedException(Path file, FormatRefusal refusal) {
            super("The bundle " + file + " is refused: " + refusal.getMessage());
        }
    }

    private CollectionRun() {
    }

    /**
     * Runs the collection. {@code starting} hears the number of package files found, {@code settled}
     * each outcome as it is settled (on the calling thread).
     */
    public static Report run(Request r, IntConsumer starting, Consumer<Outcome> settled)
            throws IOException, InvalidSourceException, BundleRefusedException, org.inkgate.admin.core.store.StoreException {
        try (CollectLock lock = CollectLock.acquire(r.storeFile());
                ResultsStore store = SqliteResultsStore.open(r.storeFile())) {
            Map<String, BundleManifest> bundles = new HashMap<>();
            TrustPolicy owner = TrustPolicy.trusting(Set.of(r.ownerSigningFingerprint()));
            for (Path f : r.bundleFiles()) {
                try (OpenedBundle b = new BundleReader(owner).open(f)) {
                    store.registerBundle(b.manifest(), b.manifestSha256(), b.signerFingerprint());
                    bundles.put(b.manifestSha256(), b.manifest());
                } catch (FormatRefusal refusal) {
                    throw new BundleRefusedException(f, refusal);
                }
            }
            List<String> examIds = bundles.values().stream().map(BundleManifest::examId).distinct().sorted().toList();
            if (r.roster() != null) {
                var candidates = RosterReader.read(r.roster());
                for (String examId : examIds) {
                    store.registerRoster(examId, candidates);
                }
            }
            if (r.exam() != null && r.exam().rubric() != null) {
                store.registerRubric(r.exam().examId(), r.exam().rubric());
            }
            if (r.assignment() != null) {
                long seed = AssignmentTable.read(r.assignment()).seed();
                for (BundleManifest m : bundles.values()) {
                    store.recordAssignmentRun(m.examId(), seed, "assignment table " + r.assignment().getFileName());
                }
            }
            List<Path> files = Collector.packageFiles(r.roots());
            starting.accept(files.size());
            Collector collector = new Collector(store, r.encryptionKey(), r.installations(), bundles, r.threads());
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
            return new Report(outcomes, offRoster, byInstallation, conflicts, missing);
        }
    }
}
