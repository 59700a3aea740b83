package org.inkgate.admin.core.testutil;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.core.bundling.BundleBuilder;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.FormAssigner;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;

/**
 * An invented live sitting for tests: exam source, roster of {@code seats} candidates in two
 * levels, seeded assignment, and the bundle built by {@link BundleBuilder} with the format's
 * fixed test keys.
 */
public record Sitting(ExamSource exam, List<RosterCandidate> roster, Assignment assignment, Path bundle,
        BundleManifest manifest, String manifestSha256) {

    public static Sitting make(Path dir, int seats) throws Exception {
        return make(dir, seats, "C%03d");
    }

    /** The same, with candidate numbers from {@code numberFormat} (e.g. {@code %04d}: numbers that start with a digit). */
    public static Sitting make(Path dir, int seats, String numberFormat) throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.valid(dir.resolve("exam-source")));
        List<RosterCandidate> roster = new ArrayList<>();
        for (int i = 1; i <= seats; i++) {
            roster.add(new RosterCandidate(String.format(numberFormat, i), i % 3 == 0 ? "B2" : "B1", "", 0, false, false,
                    java.util.Map.of("invented_name", "Invented Person " + i)));
        }
        Assignment assignment = FormAssigner.assign(roster.stream()
                .map(r -> new FormAssigner.Candidate(r.candidateNumber(), r.level())).toList(),
                FormDesigner.forms(exam), FormDesigner.blockSize(exam), 20261202L);
        Path bundle = dir.resolve("exam.inkexam");
        BundleBuilder.build(exam, roster, assignment, TestKeys.ownerKeys(), TestKeys.OWNER_SIGNING,
                "invented-pin-2468".toCharArray(), false, bundle);
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(java.util.Set.of(TestKeys.ownerFingerprint()))).open(bundle)) {
            return new Sitting(exam, roster, assignment, bundle, b.manifest(), b.manifestSha256());
        }
    }

    public String formOf(String candidate) {
        return assignment.formByCandidate().get(candidate);
    }

    public static Path folder(Path dir, String name) throws Exception {
        return Files.createDirectories(dir.resolve(name));
    }
}
