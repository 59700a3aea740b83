package org.inkgate.admin.core.bundling;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.bundle.ConditionSpec;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.OwnerKeys;
import org.inkgate.format.bundle.PackRef;
import org.inkgate.format.bundle.PinHash;
import org.inkgate.format.bundle.PinHasher;
import org.inkgate.format.bundle.ReleaseCode;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.crypto.Sha256;

/**
 * Builds a signed (optionally sealed) exam bundle from a checked exam source, its generated forms,
 * the roster with its form assignment, and the owner's keys, through the format's
 * {@link BundleWriter}. The prompts, instructions and named packs become bundle entries under
 * the same relative names they have in the source folder.
 */
public final class BundleBuilder {

    /** What was built: the manifest written and, for a sealed bundle, the release code to hand out. */
    public record Built(Path file, BundleManifest manifest, char[] releaseCode) {
    }

    private BundleBuilder() {
    }

    /** The manifest and entry contents for the exam, checked but not yet written. */
    public static Map.Entry<BundleManifest, Map<String, byte[]>> prepare(ExamSource exam, List<RosterCandidate> roster,
            Assignment assignment, OwnerKeys ownerKeys, PinHash pin) throws InvalidSourceException, IOException {
        return prepare(exam, roster, assignment, ownerKeys, pin, Listener.NONE);
    }

    /**
     * Hears how far a build is: one stage per pack checked and read (packs are the large part), then
     * signing and writing; called on the building thread.
     */
    public interface Listener {
        Listener NONE = (done, total, what) -> { };

        void stage(int done, int total, String what);
    }

    private static Map.Entry<BundleManifest, Map<String, byte[]>> prepare(ExamSource exam, List<RosterCandidate> roster,
            Assignment assignment, OwnerKeys ownerKeys, PinHash pin, Listener listener) throws InvalidSourceException, IOException {
        int stages = exam.packs().size() + 1;
        List<Problem> problems = new ArrayList<>();
        Map<String, byte[]> contents = new LinkedHashMap<>();
        if (exam.instructionsFile() != null) {
            contents.put(exam.instructionsFile(), Files.readAllBytes(exam.folder().resolve(exam.instructionsFile())));
        }
        List<TaskSpec> tasks = new ArrayList<>();
        for (ExamSource.Task t : exam.tasks()) {
            contents.put(t.promptFile(), Files.readAllBytes(exam.folder().resolve(t.promptFile())));
            tasks.add(new TaskSpec(t.id(), t.title(), t.promptFile(), t.timeLimitSeconds(), t.warningMinutes(), t.words()));
        }
        List<PackRef> packs = new ArrayList<>();
        int stage = 0;
        for (ExamSource.Pack p : exam.packs()) {
            listener.stage(stage++, stages, "checking pack " + p.id());
            Path packFile = exam.folder().resolve(p.file());
            PackCheck.check(p, packFile, problems);
            byte[] bytes = Files.readAllBytes(packFile);
            contents.put(p.file(), bytes);
            packs.add(new PackRef(p.id(), p.kind(), p.version(), p.file(), Sha256.hex(bytes)));
        }
        List<ConditionSpec> conditions = exam.conditions().stream().map(c -> new ConditionSpec(c.id(), c.label())).toList();
        List<FormSpec> forms = FormDesigner.forms(exam);
        List<RosterEntry> entries = new ArrayList<>();
        Map<String, String> formOf = assignment == null ? Map.of() : assignment.formByCandidate();
        Map<String, RosterCandidate> byNumber = new HashMap<>();
        roster.forEach(r -> byNumber.put(r.candidateNumber(), r));
        for (RosterCandidate r : roster) {
            String form = formOf.get(r.candidateNumber());
            if (form == null) {
                problems.add(new Problem("assignment", 0, 0, r.candidateNumber(), "candidate " + r.candidateNumber()
                        + " has no form; assign forms again with this roster"));
                continue;
            }
            entries.add(new RosterEntry(r.candidateNumber(), form, r.extraTimePercent(), r.largePrint(), r.highContrast()));
        }
        formOf.keySet().stream().filter(n -> !byNumber.containsKey(n)).forEach(n -> problems.add(new Problem(
                "assignment", 0, 0, n, "candidate " + n + " is assigned a form but is not on the roster; assign forms again")));
        if (!exam.practice() && pin == null) {
            problems.add(new Problem("exam.yaml", 0, 0, "practice", "a live exam needs an invigilator PIN; give one"
                    + " (or mark the exam practice: true for a practice paper)"));
        }
        if (!exam.practice() && roster.isEmpty()) {
            problems.add(new Problem("roster", 0, 0, "", "a live exam needs a roster; import one"));
        }
        if (!problems.isEmpty()) {
            throw new InvalidSourceException("the bundle for " + exam.examId() + " cannot be built", problems);
        }
        entries.sort(java.util.Comparator.comparing(RosterEntry::candidateNumber));
        BundleManifest manifest = new BundleManifest(BundleManifest.FORMAT, BundleManifest.SCHEMA_VERSION, exam.examId(),
                exam.title(), exam.language(), exam.instructionsFile(), tasks, conditions, forms, exam.questionnaires(),
                packs, entries, ownerKeys, exam.practice() ? null : pin, null, exam.practice(), Map.of(), exam.design().kind());
        return Map.entry(manifest, contents);
    }

    /**
     * Builds and writes the bundle. A sealed bundle gets a fresh release code, returned once and
     * stored nowhere: the caller hands it to invigilators.
     */
    public static Built build(ExamSource exam, List<RosterCandidate> roster, Assignment assignment, OwnerKeys ownerKeys,
            PrivateKey signingKey, char[] invigilatorPin, boolean seal, Path out) throws InvalidSourceException, IOException {
        return build(exam, roster, assignment, ownerKeys, signingKey, invigilatorPin, seal, out, Listener.NONE);
    }

    /** As above, telling {@code listener} how far it is. */
    public static Built build(ExamSource exam, List<RosterCandidate> roster, Assignment assignment, OwnerKeys ownerKeys,
            PrivateKey signingKey, char[] invigilatorPin, boolean seal, Path out, Listener listener)
            throws InvalidSourceException, IOException {
        PinHash pin = invigilatorPin == null ? null : PinHasher.hash(invigilatorPin);
        Map.Entry<BundleManifest, Map<String, byte[]>> prepared = prepare(exam, roster, assignment, ownerKeys, pin, listener);
        int stages = exam.packs().size() + 1;
        listener.stage(stages - 1, stages, seal ? "sealing, signing and writing" : "signing and writing");
        BundleWriter writer = new BundleWriter(signingKey);
        Path parent = out.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        if (seal) {
            char[] code = ReleaseCode.generate();
            writer.writeSealed(prepared.getKey(), prepared.getValue(), code, out);
            listener.stage(stages, stages, "");
            return new Built(out, prepared.getKey(), code);
        }
        writer.write(prepared.getKey(), prepared.getValue(), out);
        listener.stage(stages, stages, "");
        return new Built(out, prepared.getKey(), null);
    }
}
