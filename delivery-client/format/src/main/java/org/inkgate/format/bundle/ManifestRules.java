package org.inkgate.format.bundle;

import java.util.ArrayList;
import java.util.Base64;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.inkgate.format.crypto.AesGcm;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Pbkdf2;
import org.inkgate.format.crypto.X25519;
import org.inkgate.packs.policy.ResourcePolicy;

/**
 * The rules a manifest must keep beyond its JSON shape: ids resolve, files exist, numbers are
 * in range. The writer refuses to write a manifest that breaks them and the reader refuses to
 * open one, with every problem named.
 */
final class ManifestRules {

    static final int MAX_EXTRA_TIME_PERCENT = 400;

    private ManifestRules() {
    }

    static List<String> problems(BundleManifest m) {
        List<String> problems = new ArrayList<>();
        requireText(problems, m.examId(), "examId");
        requireText(problems, m.title(), "title");
        requireText(problems, m.language(), "language");
        if (m.design() != null && m.schemaVersion() < BundleManifest.FIRST_WITH_DESIGN) {
            problems.add("the manifest declares design \"" + m.design().word() + "\" under schemaVersion "
                    + m.schemaVersion() + ", which has no design field (a reader of that version refuses it as an"
                    + " unknown key): a manifest with a design is schemaVersion " + BundleManifest.FIRST_WITH_DESIGN);
        }
        if (m.instructionsFile() != null && !m.entries().containsKey(m.instructionsFile())) {
            problems.add("instructionsFile \"" + m.instructionsFile() + "\" is not an entry of the bundle");
        }
        Set<String> taskIds = tasks(m, problems);
        Set<String> conditionIds = unique(problems, "condition", m.conditions().stream().map(ConditionSpec::id).toList());
        for (ConditionSpec condition : m.conditions()) {
            requireText(problems, condition.label(), "label of condition \"" + condition.id() + "\"");
        }
        Set<String> questionnaireIds = questionnaires(m, problems);
        Set<String> packIds = packs(m, problems);
        Set<String> formIds = unique(problems, "form", m.forms().stream().map(FormSpec::id).toList());
        if (m.forms().isEmpty()) {
            problems.add("the bundle has no forms: add at least one form listing the tasks in order");
        }
        for (FormSpec form : m.forms()) {
            if (form.slots().isEmpty()) {
                problems.add("form \"" + form.id() + "\" has no tasks");
            }
            if (form.sittingLimitSeconds() < 0) {
                problems.add("form \"" + form.id() + "\" has a negative sittingLimitSeconds");
            }
            for (String q : new String[] {form.preQuestionnaire(), form.postQuestionnaire()}) {
                if (q != null && !questionnaireIds.contains(q)) {
                    problems.add("form \"" + form.id() + "\" names questionnaire \"" + q + "\", which the bundle does not define");
                }
            }
            if (m.design() == StudyDesign.PARALLEL
                    && form.slots().stream().map(FormSlot::conditionId).distinct().count() > 1) {
                problems.add("form \"" + form.id() + "\" mixes conditions " + form.slots().stream()
                        .map(FormSlot::conditionId).distinct().toList() + ", but the bundle declares a parallel design,"
                        + " in which a candidate sits every task under one condition: give the form one condition, or"
                        + " declare a within-candidate design (crossover or latin-square)");
            }
            Set<String> seen = new HashSet<>();
            for (FormSlot slot : form.slots()) {
                String where = "form \"" + form.id() + "\", task \"" + slot.taskId() + "\"";
                if (!taskIds.contains(slot.taskId())) {
                    problems.add(where + ": no such task");
                }
                if (!seen.add(slot.taskId())) {
                    problems.add(where + ": the task appears twice in the form");
                }
                if (!conditionIds.contains(slot.conditionId())) {
                    problems.add(where + ": condition \"" + slot.conditionId() + "\" is not defined");
                }
                policy(problems, where, slot.policy(), m, packIds);
            }
        }
        Set<String> candidates = new HashSet<>();
        for (RosterEntry r : m.roster()) {
            requireText(problems, r.candidateNumber(), "roster candidateNumber");
            if (r.candidateNumber() != null && !CandidateNumber.isValid(r.candidateNumber())) {
                problems.add("roster candidate \"" + org.inkgate.format.refusal.FormatRefusal.printable(r.candidateNumber())
                        + "\" is not a usable candidate number: use " + CandidateNumber.RULE);
            }
            if (r.candidateNumber() != null && !candidates.add(CandidateNumber.key(r.candidateNumber()))) {
                problems.add("roster lists candidate \"" + r.candidateNumber() + "\" twice (candidate numbers are"
                        + " compared without regard to letter case)");
            }
            if (r.formId() == null) {
                problems.add("roster gives candidate \"" + r.candidateNumber() + "\" no form: assign one of " + formIds);
            } else if (!formIds.contains(r.formId())) {
                problems.add("roster assigns candidate \"" + r.candidateNumber() + "\" to unknown form \"" + r.formId() + "\"");
            }
            if (r.extraTimePercent() < 0 || r.extraTimePercent() > MAX_EXTRA_TIME_PERCENT) {
                problems.add("roster gives candidate \"" + r.candidateNumber() + "\" extra time of "
                        + r.extraTimePercent() + "%, outside 0.." + MAX_EXTRA_TIME_PERCENT);
            }
        }
        ownerKeys(problems, m.ownerKeys());
        if (!m.practice() && m.invigilatorPin() == null) {
            problems.add("a bundle for a live sitting needs an invigilatorPin; only practice bundles may go without");
        }
        if (m.invigilatorPin() != null) {
            pin(problems, m.invigilatorPin());
        }
        if (m.seal() != null) {
            seal(problems, m);
        }
        return problems;
    }

    /**
     * Both keys must be usable now, not at the end of a sitting: the encryption key is tried in
     * an X25519 agreement, which refuses low-order points (RFC 7748 section 6.1).
     */
    private static void ownerKeys(List<String> problems, OwnerKeys keys) {
        if (keys == null || keys.signing() == null || keys.encryption() == null) {
            problems.add("ownerKeys must give both the signing and the encryption public key");
            return;
        }
        try {
            Ed25519.publicFromRaw(Base64.getDecoder().decode(keys.signing()));
        } catch (IllegalArgumentException e) {
            problems.add("ownerKeys.signing is not a 32-byte Ed25519 public key in base64");
        }
        try {
            X25519.agree(X25519.generate().getPrivate(), X25519.publicFromRaw(Base64.getDecoder().decode(keys.encryption())));
        } catch (IllegalArgumentException e) {
            problems.add("ownerKeys.encryption is not a usable X25519 public key: responses could not be encrypted to it");
        }
    }

    /** A PIN hash that could never match is found when the bundle opens, not when the invigilator needs it. */
    private static void pin(List<String> problems, PinHash pin) {
        if (pin.iterations() < Pbkdf2.MIN_ITERATIONS || pin.iterations() > Pbkdf2.MAX_ITERATIONS) {
            problems.add("invigilatorPin.iterations " + pin.iterations() + " is outside " + Pbkdf2.MIN_ITERATIONS + ".."
                    + Pbkdf2.MAX_ITERATIONS);
        }
        if (base64Length(pin.salt()) < 16) {
            problems.add("invigilatorPin.salt is not base64 of at least 16 bytes");
        }
        if (base64Length(pin.hash()) != 32) {
            problems.add("invigilatorPin.hash is not base64 of 32 bytes");
        }
    }

    private static void seal(List<String> problems, BundleManifest m) {
        SealSpec seal = m.seal();
        if (base64Length(seal.salt()) < 16) {
            problems.add("seal.salt is not base64 of at least 16 bytes");
        }
        if (base64Length(seal.check()) < AesGcm.NONCE_BYTES + AesGcm.TAG_BITS / 8) {
            problems.add("seal.check is not base64 of a nonce, a ciphertext and a tag");
        }
        m.entries().forEach((name, digest) -> {
            if (!digest.sealed()) {
                problems.add("entry \"" + name + "\" is not sealed in a sealed bundle: every content entry must be");
            }
        });
    }

    /** Decoded length of a base64 text, or -1 when it is missing or not base64. */
    private static int base64Length(String text) {
        try {
            return text == null ? -1 : Base64.getDecoder().decode(text).length;
        } catch (IllegalArgumentException e) {
            return -1;
        }
    }

    private static Set<String> tasks(BundleManifest m, List<String> problems) {
        if (m.tasks().isEmpty()) {
            problems.add("the bundle has no tasks");
        }
        Set<String> ids = unique(problems, "task", m.tasks().stream().map(TaskSpec::id).toList());
        for (TaskSpec task : m.tasks()) {
            requireText(problems, task.title(), "title of task \"" + task.id() + "\"");
            if (task.promptFile() == null || !m.entries().containsKey(task.promptFile())) {
                problems.add("task \"" + task.id() + "\": prompt file \"" + task.promptFile() + "\" is not an entry of the bundle");
            }
            if (task.timeLimitSeconds() < 0) {
                problems.add("task \"" + task.id() + "\": timeLimitSeconds is negative");
            }
            for (int minute : task.warningMinutes()) {
                if (minute <= 0 || minute * 60 >= task.timeLimitSeconds()) {
                    problems.add("task \"" + task.id() + "\": warning at " + minute + " minutes is not inside the time limit");
                }
            }
            WordGuidance w = task.words();
            if (w != null && (w.min() < 0 || w.max() < 0 || (w.max() > 0 && w.min() > w.max()))) {
                problems.add("task \"" + task.id() + "\": word guidance " + w.min() + ".." + w.max() + " is not a range");
            }
        }
        return ids;
    }

    private static Set<String> questionnaires(BundleManifest m, List<String> problems) {
        Set<String> ids = unique(problems, "questionnaire", m.questionnaires().stream().map(QuestionnaireSpec::id).toList());
        for (QuestionnaireSpec q : m.questionnaires()) {
            requireText(problems, q.title(), "title of questionnaire \"" + q.id() + "\"");
            q.items().forEach(item -> requireText(problems, item.text(),
                    "text of item \"" + item.id() + "\" in questionnaire \"" + q.id() + "\""));
            unique(problems, "item of questionnaire \"" + q.id() + "\"", q.items().stream().map(QuestionItem::id).toList());
            for (QuestionItem item : q.items()) {
                if (item.kind() == null) {
                    problems.add("questionnaire \"" + q.id() + "\", item \"" + item.id() + "\": kind is missing");
                } else if (item.kind() == QuestionItem.Kind.LIKERT && item.labels().size() < 2) {
                    problems.add("questionnaire \"" + q.id() + "\", item \"" + item.id() + "\": a Likert item needs at least 2 labelled points");
                }
            }
        }
        return ids;
    }

    private static Set<String> packs(BundleManifest m, List<String> problems) {
        Set<String> ids = unique(problems, "pack", m.packs().stream().map(PackRef::id).toList());
        for (PackRef pack : m.packs()) {
            requireText(problems, pack.version(), "version of pack \"" + pack.id() + "\"");
            if (pack.sha256() == null || !pack.sha256().matches("[0-9a-f]{64}")) {
                problems.add("pack \"" + pack.id() + "\": sha256 must be 64 lower-case hex digits");
            }
            EntryDigest digest = pack.file() == null ? null : m.entries().get(pack.file());
            if (digest == null) {
                problems.add("pack \"" + pack.id() + "\": file \"" + pack.file() + "\" is not an entry of the bundle");
            } else if (!digest.sealed() && !digest.sha256().equals(pack.sha256())) {
                problems.add("pack \"" + pack.id() + "\": sha256 differs from the digest of its file");
            }
            if (!"glossary".equals(pack.kind()) && !"dictionary".equals(pack.kind())) {
                problems.add("pack \"" + pack.id() + "\": kind must be glossary or dictionary, not \"" + pack.kind() + "\"");
            }
        }
        return ids;
    }

    private static void policy(List<String> problems, String where, ResourcePolicy policy, BundleManifest m, Set<String> packIds) {
        if (policy == null) {
            problems.add(where + ": no resource policy (state one, even if it offers no tools)");
            return;
        }
        packRef(problems, where, "glossaryPack", policy.glossaryPack(), "glossary", m);
        packRef(problems, where, "dictionaryPack", policy.dictionaryPack(), "dictionary", m);
    }

    private static void packRef(List<String> problems, String where, String field, String id, String kind, BundleManifest m) {
        if (id == null) {
            return;
        }
        PackRef pack = m.packs().stream().filter(p -> p.id().equals(id)).findFirst().orElse(null);
        if (pack == null) {
            problems.add(where + ": " + field + " \"" + id + "\" is not a pack of the bundle");
        } else if (!kind.equals(pack.kind())) {
            problems.add(where + ": " + field + " \"" + id + "\" is a " + pack.kind() + " pack, not a " + kind + " pack");
        }
    }

    private static Set<String> unique(List<String> problems, String what, List<String> ids) {
        Set<String> seen = new HashSet<>();
        for (String id : ids) {
            if (id == null || id.isBlank()) {
                problems.add("a " + what + " has no id");
            } else if (!seen.add(id)) {
                problems.add(what + " id \"" + id + "\" is used twice");
            }
        }
        return seen;
    }

    private static void requireText(List<String> problems, String value, String field) {
        if (value == null || value.isBlank()) {
            problems.add(field + " is missing");
        }
    }
}
