package org.inkgate.format.bundle;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The signed table of contents of an exam bundle ({@code manifest.json}). Every other entry of
 * the bundle is listed in {@link #entries()} with its SHA-256, and the manifest's exact bytes
 * are signed with the test owner's Ed25519 key. Field by field description: docs/formats.md.
 *
 * @param format            always {@link #FORMAT}
 * @param schemaVersion     the schema this manifest follows; readers refuse newer ones, and the
 *                          writer replaces it with {@link #versionFor} the design
 * @param examId            stable id of the exam, chosen by the test owner
 * @param title             title shown to candidates
 * @param language          BCP 47 tag of the exam language, e.g. en-GB
 * @param instructionsFile  entry holding the general instructions (Markdown), or null
 * @param tasks             the writing tasks, each with its prompt entry
 * @param conditions        the resource conditions tasks are sat under
 * @param forms             ordered task slots, each with its condition and resource policy
 * @param questionnaires    questionnaires a form may ask before or after the tasks
 * @param packs             resource packs embedded in the bundle
 * @param roster            candidates allowed to sit, or empty for an open sitting (practice)
 * @param ownerKeys         the test owner's public keys (signature check, response encryption)
 * @param invigilatorPin    salted hash of the invigilator PIN, or null when none is set (practice)
 * @param seal              how sealed entries are encrypted, or null for an unsealed bundle
 * @param practice          true for a practice bundle that may be sat without invigilator set-up
 * @param entries           every other entry of the bundle by name, with its digest
 * @param design            the study design the exam declares, or null in bundles written before
 *                          designs were recorded (the client does not need it; collect stores it
 *                          for the exports)
 */
public record BundleManifest(
        String format,
        int schemaVersion,
        String examId,
        String title,
        String language,
        String instructionsFile,
        List<TaskSpec> tasks,
        List<ConditionSpec> conditions,
        List<FormSpec> forms,
        List<QuestionnaireSpec> questionnaires,
        List<PackRef> packs,
        List<RosterEntry> roster,
        OwnerKeys ownerKeys,
        PinHash invigilatorPin,
        SealSpec seal,
        boolean practice,
        Map<String, EntryDigest> entries,
        StudyDesign design) {

    public static final String FORMAT = "inkgate-exam-bundle";
    /** The newest schema this build reads and writes. */
    public static final int SCHEMA_VERSION = 2;
    /**
     * The first schema with the {@code design} field. Readers of version 1 refuse unknown keys (a
     * signed manifest must have one reading), so a design must come with a version they refuse by
     * its number, with a message that names the versions, rather than as an unknown key.
     */
    public static final int FIRST_WITH_DESIGN = 2;

    /**
     * The lowest schema version that holds a manifest with this design; the writer writes it, so a
     * bundle without a design stays version 1 and still opens in clients that read only version 1.
     */
    public static int versionFor(StudyDesign design) {
        return design == null ? 1 : FIRST_WITH_DESIGN;
    }

    /** A manifest without a declared design (as written before designs were recorded). */
    public BundleManifest(String format, int schemaVersion, String examId, String title, String language,
            String instructionsFile, List<TaskSpec> tasks, List<ConditionSpec> conditions, List<FormSpec> forms,
            List<QuestionnaireSpec> questionnaires, List<PackRef> packs, List<RosterEntry> roster,
            OwnerKeys ownerKeys, PinHash invigilatorPin, SealSpec seal, boolean practice,
            Map<String, EntryDigest> entries) {
        this(format, schemaVersion, examId, title, language, instructionsFile, tasks, conditions, forms,
                questionnaires, packs, roster, ownerKeys, invigilatorPin, seal, practice, entries, null);
    }

    @com.fasterxml.jackson.annotation.JsonCreator
    public BundleManifest {
        tasks = List.copyOf(Objects.requireNonNullElse(tasks, List.of()));
        conditions = List.copyOf(Objects.requireNonNullElse(conditions, List.of()));
        forms = List.copyOf(Objects.requireNonNullElse(forms, List.of()));
        questionnaires = List.copyOf(Objects.requireNonNullElse(questionnaires, List.of()));
        packs = List.copyOf(Objects.requireNonNullElse(packs, List.of()));
        roster = List.copyOf(Objects.requireNonNullElse(roster, List.of()));
        entries = entries == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(entries));
    }

    public Optional<TaskSpec> task(String taskId) {
        return tasks.stream().filter(t -> t.id().equals(taskId)).findFirst();
    }

    public Optional<FormSpec> form(String formId) {
        return forms.stream().filter(f -> f.id().equals(formId)).findFirst();
    }

    public Optional<ConditionSpec> condition(String conditionId) {
        return conditions.stream().filter(c -> c.id().equals(conditionId)).findFirst();
    }

    public Optional<QuestionnaireSpec> questionnaire(String questionnaireId) {
        return questionnaires.stream().filter(q -> q.id().equals(questionnaireId)).findFirst();
    }

    /** A copy declaring the given study design. */
    public BundleManifest withDesign(StudyDesign newDesign) {
        return new BundleManifest(format, schemaVersion, examId, title, language, instructionsFile, tasks,
                conditions, forms, questionnaires, packs, roster, ownerKeys, invigilatorPin, seal, practice,
                entries, newDesign);
    }

    /** A copy following the given schema version; the writer sets the lowest one that holds the content. */
    public BundleManifest withSchemaVersion(int newVersion) {
        return new BundleManifest(format, newVersion, examId, title, language, instructionsFile, tasks,
                conditions, forms, questionnaires, packs, roster, ownerKeys, invigilatorPin, seal, practice,
                entries, design);
    }

    public boolean sealed() {
        return seal != null;
    }

    /** A copy with a different entry table; the writer fills it in after hashing the entries. */
    public BundleManifest withEntries(Map<String, EntryDigest> newEntries) {
        return new BundleManifest(format, schemaVersion, examId, title, language, instructionsFile, tasks,
                conditions, forms, questionnaires, packs, roster, ownerKeys, invigilatorPin, seal, practice,
                newEntries, design);
    }

    /** A copy carrying the given seal parameters. */
    public BundleManifest withSeal(SealSpec newSeal) {
        return new BundleManifest(format, schemaVersion, examId, title, language, instructionsFile, tasks,
                conditions, forms, questionnaires, packs, roster, ownerKeys, invigilatorPin, newSeal, practice,
                entries, design);
    }
}
