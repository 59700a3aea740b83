package org.inkgate.admin.core.collection;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.response.EventContract;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.admin.core.store.EventLog;
import org.inkgate.admin.core.store.EventText;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.SittingRecord;
import org.inkgate.admin.core.store.StoreException;

/**
 * Imports response packages into the results store, one transaction per package. Packages are
 * opened (decrypted, signature, digests and hash chain checked) on a few worker threads and
 * stored in file order by the calling thread, so a killed import leaves only whole packages and
 * a rerun imports the rest. Importing the same bytes again changes nothing; a copy with the
 * same package id and content changes nothing; a different package for a candidate who already
 * has one is kept beside it and shows up as a conflict; a package whose process log breaks the
 * event contract ({@link EventContract}: unknown type, missing data key, wrong level, a task not in
 * the form) is refused naming the events; a refused package is listed with its reason and changes
 * nothing else.
 */
public final class Collector {

    public static final String EXTENSION = ".inkresp";

    private final ResultsStore store;
    private final ResponsePackageReader reader;
    private final Map<String, BundleManifest> bundles;
    /** Each bundle's candidate numbers, by manifest SHA-256: looked up once per package, not searched. */
    private final Map<String, Set<String>> rosters;
    private final int threads;

    /**
     * @param bundles the registered bundles by manifest SHA-256: a package must come from one of them
     */
    public Collector(ResultsStore store, PrivateKey ownerEncryptionKey, TrustPolicy installations,
            Map<String, BundleManifest> bundles, int threads) {
        this.store = store;
        this.reader = new ResponsePackageReader(ownerEncryptionKey, installations);
        this.bundles = Map.copyOf(bundles);
        Map<String, Set<String>> numbers = new java.util.HashMap<>();
        bundles.forEach((sha, manifest) -> numbers.put(sha, manifest.roster().stream()
                .map(org.inkgate.format.bundle.RosterEntry::candidateNumber).collect(java.util.stream.Collectors.toUnmodifiableSet())));
        this.rosters = Map.copyOf(numbers);
        this.threads = Math.max(1, threads);
    }

    /** Every .inkresp file under the given files and folders, in a stable order. */
    public static List<Path> packageFiles(List<Path> roots) throws IOException {
        List<Path> files = new ArrayList<>();
        for (Path root : roots) {
            if (Files.isDirectory(root)) {
                try (Stream<Path> walk = Files.walk(root)) {
                    walk.filter(p -> Files.isRegularFile(p) && p.getFileName().toString().endsWith(EXTENSION))
                            .sorted().forEach(files::add);
                }
            } else if (Files.isRegularFile(root)) {
                files.add(root);
            } else {
                throw new IOException(root + " does not exist; name folders or " + EXTENSION + " files to collect");
            }
        }
        return files;
    }

    /** A file refused by its size alone, before reading. */
    private static final class TooLarge extends IOException {
        TooLarge(String message) {
            super(message);
        }
    }

    /**
     * A package read by a worker: opened, or refused, or skipped because its bytes are known. An
     * opened one carries what breaks the event contract (null when nothing does), checked on the
     * reading thread because it depends on the package alone; the single writer reports it in
     * its turn among the other checks, as before.
     */
    private record Read(Path file, String sha256, OpenedResponse opened, SittingRecord record, FormatRefusal refusal,
            IOException failure, boolean known, String contractBreaches) {

        Read(Path file, String sha256, OpenedResponse opened, SittingRecord record, FormatRefusal refusal,
                IOException failure, boolean known) {
            this(file, sha256, opened, record, refusal, failure, known, null);
        }
    }

    /** Imports the files; reports each outcome to {@code progress} as it is settled. */
    public List<Outcome> collect(List<Path> files, Consumer<Outcome> progress) throws StoreException {
        Set<String> known = store.importedPackageFiles();
        List<Outcome> outcomes = new ArrayList<>();
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "inkgate-collect");
            t.setDaemon(true);
            return t;
        });
        try {
            Deque<Future<Read>> window = new ArrayDeque<>();
            int next = 0;
            while (next < files.size() || !window.isEmpty()) {
                while (next < files.size() && window.size() < threads * 2) {
                    Path file = files.get(next++);
                    window.add(pool.submit(() -> read(file, known)));
                }
                Read read;
                try {
                    read = window.removeFirst().get();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new StoreException("collection interrupted; run the same collect again to finish");
                } catch (ExecutionException e) {
                    throw new IllegalStateException("reading a package failed unexpectedly: " + e.getCause(), e.getCause());
                }
                Outcome outcome = settle(read);
                outcomes.add(outcome);
                progress.accept(outcome);
            }
        } finally {
            pool.shutdownNow();
        }
        return outcomes;
    }

    private Read read(Path file, Set<String> known) {
        try {
            String tooLarge = PackageSizeCheck.tooLarge(file);
            if (tooLarge != null) {
                return new Read(file, null, null, null, null, new TooLarge(tooLarge), false);
            }
            // read once: the same bytes are hashed (to skip known packages) and opened
            byte[] bytes = Files.readAllBytes(file);
            String sha = Sha256.hex(bytes);
            if (known.contains(sha)) {
                return new Read(file, sha, null, null, null, null, true);
            }
            try {
                OpenedResponse opened = reader.open(file.getFileName().toString(), bytes, sha);
                // digest and row rendering here, on the reading threads, so the single writer only stores
                return new Read(file, sha, opened, record(opened, file.toString()), null, null, false,
                        contractBreaches(opened.response(), opened.events()));
            } catch (FormatRefusal refusal) {
                return new Read(file, sha, null, null, refusal, null, false);
            }
        } catch (IOException e) {
            return new Read(file, null, null, null, null, e, false);
        }
    }

    /**
     * Names what a package says, whatever bytes carry it: the response document and every event,
     * field by field (length-prefixed, so no two different logs feed the digest the same bytes).
     * Cheaper than re-encoding the log as JSON lines, and equally exact.
     */
    static String contentSha256(OpenedResponse opened) {
        return record(opened, "").contentSha256();
    }

    /**
     * The package's event log to store and its content digest, from one pass over the events: each time
     * and each data map is written out once and serves both (before, the digest and the rows each
     * rendered them, the data through Jackson every time). The digest's text is unchanged:
     * seq|at|mono|type|task|data with the data map's {@code toString} ({@code ContentDigestTest}).
     */
    static SittingRecord record(OpenedResponse opened, String sourceFile) {
        java.util.List<org.inkgate.format.response.ProcessEvent> events = opened.events();
        EventLog log = new EventLog(events.size());
        ContentDigest digest = new ContentDigest();
        digest.add(Json.writeLine(opened.response()));
        StringBuilder line = new StringBuilder(256);
        org.inkgate.format.response.EventLines lines = opened.eventLines();
        for (int i = 0; i < events.size(); i++) {
            if (lines.plain(i)) {
                // the line's own bytes, which are the JSON of the values (EventLines): nothing to write out
                log.addPlain(lines, i);
                digest.addPlain(lines, i);
                continue;
            }
            org.inkgate.format.response.ProcessEvent e = events.get(i);
            String at = org.inkgate.format.json.InstantText.text(e.at());
            // the same characters as seq|at|mono|type|task|data by string concatenation: stored digests stay valid
            line.setLength(0);
            line.append(e.seq()).append('|').append(at).append('|').append(e.mono()).append('|').append(e.type())
                    .append('|').append(e.task()).append('|');
            log.add(e.seq(), at, e.mono(), e.type(), e.task(), e.data(), line);
            digest.add(line);
        }
        return new SittingRecord(opened, digest.hex(), sourceFile, log.text());
    }

    private Outcome settle(Read r) throws StoreException {
        String name = r.file().toString();
        if (r.failure() instanceof TooLarge tooLarge) {
            return new Outcome.Refused(name, "too-large", tooLarge.getMessage());
        }
        if (r.failure() != null) {
            return new Outcome.Refused(name, "unreadable", "cannot be read: " + r.failure().getMessage()
                    + ". Copy the file again from the candidate's machine or the invigilator's copy");
        }
        if (r.known() || store.sittingByPackageFile(r.sha256()).isPresent()) {
            return new Outcome.AlreadyImported(name);
        }
        if (r.refusal() != null) {
            return refuse(r, r.refusal().getClass().getSimpleName(), r.refusal().getMessage());
        }
        OpenedResponse opened = r.opened();
        ResponseDocument d = opened.response();
        List<PackageContentRules.Breach> breaches = PackageContentRules.beforeBundle(d);
        breaches.addAll(PackageContentRules.nulCharacters(d, opened.events(), opened.eventLines()));
        if (!breaches.isEmpty()) {
            return refuse(r, breaches);
        }
        BundleManifest bundle = bundles.get(d.bundleManifestSha256());
        if (bundle == null) {
            return refuse(r, "unknown-bundle", name + ": written from a bundle (manifest " + d.bundleManifestSha256()
                    + ", exam \"" + d.examId() + "\") that was not given to this collection. Collect it with the bundle"
                    + " of its sitting (--bundle); if that bundle is not yours, set the package aside");
        }
        String mismatch = formMismatch(bundle, d);
        if (mismatch != null) {
            return refuse(r, "form-mismatch", name + ": " + mismatch + ". The client that wrote it did not follow the"
                    + " signed bundle; keep the file and report it");
        }
        String broken = r.contractBreaches();
        if (broken != null) {
            return refuse(r, "event-contract", name + ": " + broken + ". Nothing of it was counted. The client that wrote it"
                    + " did not keep the event contract (docs/formats.md, \"Event types\"); keep the file and report it with"
                    + " the client version \"" + org.inkgate.format.refusal.FormatRefusal.printable(shorten(d.clientVersion()))
                    + "\"");
        }
        breaches = PackageContentRules.withBundle(bundle, d);
        if (!breaches.isEmpty()) {
            return refuse(r, breaches);
        }
        // another collect into the same store may have stored this very file since this one looked:
        // then it is already imported, not a second copy with other bytes
        if (store.sittingByContent(d.packageId(), r.record().contentSha256()).isPresent()
                || store.importSitting(r.record()).isEmpty()) {
            return store.sittingByPackageFile(r.sha256()).isPresent() ? new Outcome.AlreadyImported(name)
                    : new Outcome.SameAsImported(name, d.packageId());
        }
        Set<String> roster = rosters.get(d.bundleManifestSha256());
        boolean onRoster = roster.isEmpty() || roster.contains(d.candidateNumber());
        return new Outcome.Imported(name, d.candidateNumber(), d.formId(), d.packageId(), opened.installationFingerprint(),
                onRoster);
    }

    /** Refuses a package that breaks content rules, under the first breach's reason, listing every breach. */
    private Outcome refuse(Read r, List<PackageContentRules.Breach> breaches) throws StoreException {
        StringBuilder message = new StringBuilder(r.file().toString()).append(": ");
        for (int i = 0; i < breaches.size(); i++) {
            message.append(i == 0 ? "" : "; ").append(breaches.get(i).message());
        }
        return refuse(r, breaches.get(0).reason(), message + ". Nothing of it was imported; keep the file and report it:"
                + " a client of this version does not write such a package");
    }

    private Outcome refuse(Read r, String reason, String message) throws StoreException {
        store.recordRefusal(r.sha256(), r.file().toString(), reason, message);
        return new Outcome.Refused(r.file().toString(), reason, message);
    }

    /** How many broken events a refusal lists before it only counts the rest. */
    static final int LISTED_BREACHES = 5;

    /**
     * Null when every event keeps the contract of {@link EventContract}; otherwise what breaks it,
     * event by event (seq and type), so a person can find the lines in events.jsonl.
     */
    static String contractBreaches(ResponseDocument d, List<org.inkgate.format.response.ProcessEvent> events) {
        List<EventContract.Violation> v = EventContract.check(d, events);
        if (v.isEmpty()) {
            return null;
        }
        StringBuilder out = new StringBuilder("its process log (events.jsonl) breaks the event contract "
                + v.size() + (v.size() == 1 ? " time: " : " times: "));
        for (int i = 0; i < Math.min(LISTED_BREACHES, v.size()); i++) {
            out.append(i == 0 ? "" : "; ").append(v.get(i).describe());
        }
        if (v.size() > LISTED_BREACHES) {
            out.append("; and ").append(v.size() - LISTED_BREACHES).append(" more");
        }
        return out.toString();
    }

    private static String shorten(String s) {
        return s == null ? "" : s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }

    /** The response must follow its form in the signed bundle: the same tasks, conditions and policies in order. */
    static String formMismatch(BundleManifest bundle, ResponseDocument d) {
        if (!bundle.examId().equals(d.examId())) {
            return "names exam \"" + d.examId() + "\" but its bundle is of exam \"" + bundle.examId() + "\"";
        }
        FormSpec form = bundle.form(d.formId()).orElse(null);
        if (form == null) {
            return "names form \"" + d.formId() + "\", which the bundle does not have";
        }
        if (form.slots().size() != d.tasks().size()) {
            return "has " + d.tasks().size() + " task responses where form " + form.id() + " has " + form.slots().size()
                    + " tasks";
        }
        for (int i = 0; i < form.slots().size(); i++) {
            FormSlot slot = form.slots().get(i);
            TaskResponse t = d.tasks().get(i);
            if (!slot.taskId().equals(t.taskId()) || !slot.conditionId().equals(t.conditionId())
                    || !slot.policy().equals(t.policy())) {
                return "task " + (i + 1) + " (" + t.taskId() + " under " + t.conditionId() + ") differs from form "
                        + form.id() + "'s task " + (i + 1) + " (" + slot.taskId() + " under " + slot.conditionId()
                        + ") or from its resource policy";
            }
        }
        return null;
    }
}
