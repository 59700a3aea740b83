package org.inkgate.client.testutil;

import java.util.List;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.testutil.SampleExam;

/** Sitting plans over the format module's sample exam (invented content, test keys). */
public final class SittingFixtures {

    /** Stands in for the manifest digest; the sitting only compares it. */
    public static final String SHA = "ab".repeat(32);

    private SittingFixtures() {
    }

    /** Candidate 1001: form A (t1 with tools, 1200 s, warning at 5 min; t2 without, 1800 s, warnings 5 and 1), no extra time. */
    public static SittingPlan candidate1001() {
        return SittingPlan.forCandidate(SampleExam.manifest(), SHA, "sample.inkexam", "1001", "seat 4", null, "test");
    }

    /** Candidate 1002: form B, 25 % extra time. */
    public static SittingPlan candidate1002() {
        return SittingPlan.forCandidate(SampleExam.manifest(), SHA, "sample.inkexam", "1002", "seat 5", null, "test");
    }

    /** The sample exam with a whole-sitting limit on every form. */
    public static BundleManifest withSittingLimit(int seconds) {
        BundleManifest m = SampleExam.manifest();
        List<FormSpec> forms = m.forms().stream()
                .map(f -> new FormSpec(f.id(), f.slots(), f.preQuestionnaire(), f.postQuestionnaire(), seconds)).toList();
        return new BundleManifest(m.format(), m.schemaVersion(), m.examId(), m.title(), m.language(), m.instructionsFile(),
                m.tasks(), m.conditions(), forms, m.questionnaires(), m.packs(), m.roster(), m.ownerKeys(), m.invigilatorPin(),
                m.seal(), m.practice(), m.entries());
    }
}
