package org.inkgate.admin.gui.rating;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.inkgate.admin.core.bundling.BundleBuilder;
import org.inkgate.admin.core.collection.CollectionRun;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.FormAssigner;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.testutil.DemoSource;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;

/**
 * A real results store for the desk's tests, made the way a test owner makes one: the invented
 * demo exam and roster (src/demo) bundled with the format's fixed test keys, a simulated package
 * per candidate, collected, raters added and responses assigned (two raters each, seeded). It
 * also returns what raters must never see: each candidate's number, level and form, and the
 * exam's condition ids and labels.
 */
public record RatedStore(Path file, ExamSource exam, List<String> hiddenFacts) {

    static final long SEED = 20261202L;

    public static RatedStore make(Path dir, List<String> raterIds) throws Exception {
        ExamSource exam = ExamSourceReader.read(DemoSource.copyExam(dir.resolve("exam-source")));
        Path rosterFile = DemoSource.DEMO.resolve("roster.csv");
        List<RosterCandidate> roster = RosterReader.read(rosterFile);
        Assignment assignment = FormAssigner.assign(roster.stream()
                .map(r -> new FormAssigner.Candidate(r.candidateNumber(), r.level())).toList(),
                FormDesigner.forms(exam), FormDesigner.blockSize(exam), SEED);
        Path bundle = dir.resolve("demo.inkexam");
        BundleBuilder.build(exam, roster, assignment, TestKeys.ownerKeys(), TestKeys.OWNER_SIGNING,
                "invented-pin-2468".toCharArray(), false, bundle);
        Path packages = Files.createDirectories(dir.resolve("packages"));
        List<String> hidden = new ArrayList<>();
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint()))).open(bundle)) {
            SimulatedSitting sitting = new SimulatedSitting(b.manifest(), b.manifestSha256(), TestKeys.INSTALLATION_SIGNING,
                    TestKeys.ownerEncryptionPublic());
            long seed = 1;
            for (RosterEntry r : b.manifest().roster()) {
                sitting.write(r.candidateNumber(), r.formId(), seed++, 20, packages.resolve(r.candidateNumber() + ".inkresp"));
                hidden.add(r.candidateNumber());
                hidden.add(r.formId());
            }
        }
        roster.forEach(r -> hidden.add(r.level()));
        exam.conditions().forEach(c -> {
            hidden.add(c.id());
            hidden.add(c.label());
        });
        Path store = dir.resolve("results.db");
        CollectionRun.run(new CollectionRun.Request(store, List.of(bundle), List.of(packages), TestKeys.OWNER_ENCRYPTION,
                TestKeys.ownerFingerprint(), TestKeys.installations(), rosterFile, exam, null, 1), n -> { }, o -> { });
        RatedStore collected = new RatedStore(store, exam, List.copyOf(hidden.stream().distinct().toList()));
        if (!raterIds.isEmpty()) {
            try (RatingStore rating = StoreFixture.of(store).rating(exam.examId())) {
                for (String id : raterIds) {
                    rating.addRater(id, "", null);
                }
                rating.assign(2, SEED, false);
            }
        }
        return collected;
    }

    /** The store as collect leaves it: no raters, nothing assigned. */
    public static RatedStore collected(Path dir) throws Exception {
        return make(dir, List.of());
    }

    public RatingStore open() throws Exception {
        return StoreFixture.of(file).rating(exam.examId());
    }
}
