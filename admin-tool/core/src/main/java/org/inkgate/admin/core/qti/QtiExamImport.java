package org.inkgate.admin.core.qti;

import static org.inkgate.admin.core.qti.QtiDom.attribute;
import static org.inkgate.admin.core.qti.QtiDom.children;
import static org.inkgate.admin.core.qti.QtiDom.descendants;
import static org.inkgate.admin.core.qti.QtiDom.local;
import static org.inkgate.admin.core.qti.QtiDom.printable;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLGenerator;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.Problem;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * Extended-text items and tests from QTI 3.0 packages (and QTI 2.2 items) into a new exam source
 * folder: tasks with prompts, time limits, expected length, the rubric from the scorers' rubric
 * block, instructions from the test's rubric block for candidates, resource policies from
 * Inkgate's own elements, and the settings file Inkgate's export adds. Everything the package holds
 * that has no place in Inkgate is listed in the report; any other interaction type is refused with a
 * message naming the item. The folder is then checked by {@link ExamSourceReader} like any source.
 * Mapping: docs/formats.md, "Tasks as a QTI 3.0 content package".
 */
public final class QtiExamImport {

    private static final String ID = "[A-Za-z0-9][A-Za-z0-9._-]{0,63}";

    /**
     * The outcome.
     *
     * @param examId   the exam id written to exam.yaml
     * @param tasks    tasks imported
     * @param notes    what the package held that has no place in Inkgate, or was filled in
     * @param problems what the exam source check found in the written folder (empty: ready to use)
     */
    public record Report(String examId, int tasks, List<String> notes, List<Problem> problems) {
        public Report {
            notes = List.copyOf(notes);
            problems = List.copyOf(problems);
        }
    }

    /** The package cannot become an exam source: another interaction type, nothing to import, broken XML. */
    public static final class ImportRefusal extends Exception {
        public ImportRefusal(String message) {
            super(message);
        }
    }

    private record ItemRef(String path, int timeLimitSeconds) {
    }

    private record ImportedTask(String id, String title, String language, String prompt, int timeLimitSeconds,
            Integer wordsMin, Integer wordsMax, List<Integer> warnings, Map<String, ObjectNode> policies,
            Map<String, String> conditionLabels, ObjectNode rubric) {
    }

    private final PackageFiles files;
    private final List<String> notes = new ArrayList<>();
    private final YAMLMapper yaml = YAMLMapper.builder().disable(YAMLGenerator.Feature.WRITE_DOC_START_MARKER)
            .enable(YAMLGenerator.Feature.MINIMIZE_QUOTES).enable(YAMLGenerator.Feature.ALWAYS_QUOTE_NUMBERS_AS_STRINGS)
            .build();

    private final QtiPromptReader prompts = new QtiPromptReader(notes);
    private final QtiRubricReader rubrics = new QtiRubricReader(yaml, notes);

    private QtiExamImport(PackageFiles files) {
        this.files = files;
    }

    /** Imports {@code files} into {@code folder}, which must not exist yet or be empty. */
    public static Report run(PackageFiles files, Path folder) throws ImportRefusal, IOException {
        if (Files.exists(folder)) {
            try (var s = Files.list(folder)) {
                if (s.findAny().isPresent()) {
                    throw new ImportRefusal(folder + " is not empty; give a new folder for the imported exam source");
                }
            }
        }
        return new QtiExamImport(files).importInto(folder);
    }

    private Report importInto(Path folder) throws ImportRefusal, IOException {
        Optional<String> testPath = Optional.empty();
        List<String> itemPaths = new ArrayList<>();
        Optional<byte[]> manifest = files.file(QtiNames.MANIFEST_FILE);
        if (manifest.isPresent()) {
            Element root = parse(QtiNames.MANIFEST_FILE, manifest.get()).getDocumentElement();
            for (Element r : descendants(root, "resource")) {
                String type = r.getAttribute("type");
                Optional<String> href = PackageFiles.resolve(QtiNames.MANIFEST_FILE, r.getAttribute("href"));
                if (type.startsWith("imsqti_test_xml")) {
                    if (testPath.isPresent()) {
                        notes.add("the manifest lists more than one test; only " + testPath.get() + " was imported");
                    } else {
                        testPath = href;
                    }
                } else if (type.startsWith("imsqti_item_xml")) {
                    href.ifPresent(itemPaths::add);
                } else if (!type.equals("associatedcontent/learning-application-resource")
                        || !r.getAttribute("href").equals(QtiNames.SETTINGS_FILE)) {
                    notes.add("resource " + r.getAttribute("identifier") + " (" + type + ") has no place in Inkgate; left out");
                }
            }
        } else {
            for (var e : files.files().entrySet()) {
                if (e.getKey().toLowerCase(Locale.ROOT).endsWith(".xml")) {
                    String name = parse(e.getKey(), e.getValue()).getDocumentElement().getLocalName();
                    if (name.equals("qti-assessment-test") || name.equals("assessmentTest")) {
                        testPath = testPath.or(() -> Optional.of(e.getKey()));
                    } else {
                        itemPaths.add(e.getKey());
                    }
                }
            }
        }
        String examId;
        String title;
        String instructions = null;
        int sittingLimit = 0;
        List<ItemRef> refs = new ArrayList<>();
        if (testPath.isPresent()) {
            String path = testPath.get();
            Element test = parse(path, files.file(path).orElseThrow(() -> new ImportRefusal(
                    "the manifest names test " + path + ", which is not in the package"))).getDocumentElement();
            examId = id(QtiIdentifier.decode(test.getAttribute("identifier")).orElse(test.getAttribute("identifier")),
                    "test identifier");
            title = test.getAttribute("title");
            for (Element child : children(test)) {
                switch (local(child)) {
                    case "qti-time-limits", "timeLimits" -> sittingLimit = seconds(child, "test " + examId);
                    case "qti-rubric-block", "rubricBlock" -> {
                        if (child.getAttribute("view").contains("candidate")) {
                            instructions = MarkdownBlocks.toMarkdown(prompts.blocks(QtiPromptReader.content(child), "test instructions"));
                        } else {
                            notes.add("a test rubric block for " + child.getAttribute("view") + " has no place in Inkgate");
                        }
                    }
                    case "qti-test-part", "testPart" -> collect(child, path, 0, refs);
                    case "qti-outcome-declaration", "outcomeDeclaration", "qti-outcome-processing", "outcomeProcessing" ->
                            notes.add("test " + local(child) + " left out: Inkgate scores come from raters");
                    default -> notes.add("test element " + local(child) + " has no place in Inkgate; left out");
                }
            }
            if (children(test).stream().filter(c -> local(c).equals("qti-test-part") || local(c).equals("testPart"))
                    .count() > 1) {
                notes.add("the test has several test parts; their sections became one list of tasks");
            }
        } else {
            if (itemPaths.isEmpty()) {
                throw new ImportRefusal(files.source() + " holds no QTI test or item");
            }
            for (String p : itemPaths) {
                refs.add(new ItemRef(p, 0));
            }
            examId = null;
            title = null;
            notes.add("the package has no test: the items became tasks in the order listed, without time limits");
        }
        List<ImportedTask> tasks = new ArrayList<>();
        for (ItemRef ref : refs) {
            tasks.add(item(ref));
        }
        if (tasks.isEmpty()) {
            throw new ImportRefusal(files.source() + ": the test holds no item reference that resolves inside the package");
        }
        if (examId == null) {
            examId = tasks.get(0).id() + "-exam";
            title = tasks.get(0).title();
            notes.add("exam id " + examId + " and title made from the first item; change them in exam.yaml");
        }
        Set<String> ids = new LinkedHashSet<>();
        for (ImportedTask t : tasks) {
            if (!ids.add(t.id())) {
                throw new ImportRefusal("task id " + t.id() + " is used by two items; Inkgate needs each task once");
            }
        }
        write(folder, examId, title, instructions, sittingLimit, tasks);
        List<Problem> problems = new ArrayList<>();
        ExamSourceReader.check(folder, problems);
        return new Report(examId, tasks.size(), notes, problems);
    }

    /** Item references in document order, with the innermost time limit above them. */
    private void collect(Element parent, String path, int limit, List<ItemRef> refs) throws ImportRefusal {
        int here = limit;
        for (Element child : children(parent)) {
            if (local(child).equals("qti-time-limits") || local(child).equals("timeLimits")) {
                here = seconds(child, parent.getAttribute("identifier"));
            }
        }
        for (Element child : children(parent)) {
            switch (local(child)) {
                case "qti-assessment-section", "assessmentSection" -> collect(child, path, here, refs);
                case "qti-assessment-item-ref", "assessmentItemRef" -> {
                    int own = here;
                    for (Element c : children(child)) {
                        if (local(c).equals("qti-time-limits") || local(c).equals("timeLimits")) {
                            own = seconds(c, child.getAttribute("identifier"));
                        }
                    }
                    String href = child.getAttribute("href");
                    Optional<String> resolved = PackageFiles.resolve(path, href);
                    if (resolved.isEmpty() || files.file(resolved.get()).isEmpty()) {
                        throw new ImportRefusal("item reference " + child.getAttribute("identifier") + " points to "
                                + href + ", which is not a file inside the package");
                    }
                    refs.add(new ItemRef(resolved.get(), own));
                }
                case "qti-assessment-section-ref", "assessmentSectionRef", "include" ->
                        throw new ImportRefusal("section " + child.getAttribute("identifier") + " is kept in another file"
                                + " (" + local(child) + "); Inkgate imports tests whose sections are written inline");
                case "qti-selection", "selection", "qti-ordering", "ordering", "qti-branch-rule", "branchRule",
                        "qti-pre-condition", "preCondition" ->
                        notes.add(local(child) + " in " + parent.getAttribute("identifier") + " has no place in Inkgate"
                                + " (forms decide which tasks and in which order); left out");
                case "qti-rubric-block", "rubricBlock" ->
                        notes.add("a rubric block of section " + parent.getAttribute("identifier") + " left out");
                default -> {
                }
            }
        }
    }

    private ImportedTask item(ItemRef ref) throws ImportRefusal {
        String where = ref.path();
        Element item = parse(where, files.file(where).orElseThrow()).getDocumentElement();
        if (!(local(item).equals("qti-assessment-item") || local(item).equals("assessmentItem"))) {
            throw new ImportRefusal(where + " is a " + local(item) + ", not an item");
        }
        String rawId = item.getAttribute("identifier");
        String id = id(QtiIdentifier.decode(rawId).orElse(rawId), "item " + where);
        where = where + " (item " + rawId + ")";
        List<Element> interactions = new ArrayList<>();
        for (Element e : descendants(item, null)) {
            if (local(e).toLowerCase(Locale.ROOT).endsWith("interaction")) {
                interactions.add(e);
            }
        }
        for (Element e : interactions) {
            if (!(local(e).equals("qti-extended-text-interaction") || local(e).equals("extendedTextInteraction"))) {
                throw new ImportRefusal(where + ": " + local(e) + " is not an extended-text interaction; Inkgate imports"
                        + " essay tasks (qti-extended-text-interaction) only. Leave this item out of the package and"
                        + " import again");
            }
        }
        if (interactions.size() != 1) {
            throw new ImportRefusal(where + ": " + (interactions.isEmpty() ? "no interaction" : interactions.size()
                    + " extended-text interactions") + "; an Inkgate task takes exactly one written answer");
        }
        Element interaction = interactions.get(0);
        StringBuilder prompt = new StringBuilder();
        ObjectNode rubric = null;
        Integer wordsMin = null;
        Integer wordsMax = null;
        List<Integer> warnings = new ArrayList<>();
        Map<String, ObjectNode> policies = new LinkedHashMap<>();
        Map<String, String> labels = new LinkedHashMap<>();
        List<MarkdownBlocks.Block> blocks = new ArrayList<>();
        for (Element child : children(item)) {
            switch (local(child)) {
                case "qti-item-body", "itemBody" -> {
                    for (Element part : children(child)) {
                        String name = local(part);
                        if (name.equals("qti-rubric-block") || name.equals("rubricBlock")) {
                            if (part.getAttribute("view").contains("scorer")) {
                                rubric = rubrics.rubric(part, where);
                            } else {
                                blocks.addAll(prompts.blocks(QtiPromptReader.content(part), where));
                                notes.add(where + ": a rubric block for " + part.getAttribute("view")
                                        + " became part of the prompt");
                            }
                        } else {
                            blocks.addAll(prompts.blocks(List.of(part), where));
                        }
                    }
                }
                case "qti-companion-materials-info", "companionMaterialsInfo" -> {
                    for (Element m : children(child)) {
                        if (QtiNames.INKGATE.equals(m.getNamespaceURI())) {
                            switch (m.getLocalName()) {
                                case "resource-policy" -> {
                                    policies.put(m.getAttribute("condition"), policy(m));
                                    labels.put(m.getAttribute("condition"), m.getAttribute("condition-label"));
                                }
                                case "word-guidance" -> {
                                    wordsMin = integer(m.getAttribute("min"), where);
                                    wordsMax = integer(m.getAttribute("max"), where);
                                }
                                case "time-warnings" -> {
                                    for (String w : m.getAttribute("minutes-before-end").trim().split("\\s+")) {
                                        warnings.add(integer(w, where));
                                    }
                                }
                                default -> notes.add(where + ": Inkgate element " + m.getLocalName() + " not known here");
                            }
                        } else {
                            notes.add(where + ": companion material " + local(m) + " has no place in Inkgate; left out");
                        }
                    }
                }
                case "qti-response-declaration", "responseDeclaration" -> {
                }
                case "qti-outcome-declaration", "outcomeDeclaration" -> {
                    // the human-scored SCORE Inkgate writes only repeats the rubric's range
                    if (!attribute(child, "external-scored", "externalScored").equals("human")) {
                        notes.add(where + ": " + local(child) + " " + child.getAttribute("identifier")
                                + " left out (raters score Inkgate tasks)");
                    }
                }
                case "qti-response-processing", "responseProcessing" ->
                        notes.add(where + ": " + local(child) + " left out (raters score Inkgate tasks)");
                default -> notes.add(where + ": " + local(child) + " has no place in Inkgate; left out");
            }
        }
        prompt.append(MarkdownBlocks.toMarkdown(blocks));
        if (blocks.isEmpty()) {
            notes.add(where + ": the item has no prompt text; write prompts/" + id + ".md");
        }
        if (wordsMax == null) {
            String length = attribute(interaction, "expected-length", "expectedLength");
            if (!length.isEmpty()) {
                wordsMin = 0;
                wordsMax = Math.max(1, Math.round(integer(length, where) / (float) QtiExamExport.CHARACTERS_PER_WORD));
                notes.add(where + ": expected length " + length + " characters read as at most " + wordsMax + " words ("
                        + QtiExamExport.CHARACTERS_PER_WORD + " characters a word, common practice); check it");
            }
        }
        if (ref.timeLimitSeconds() == 0) {
            notes.add(where + ": no time limit in the package; the task is untimed (timeLimitMinutes: 0) until you set one");
        }
        String language = item.getAttributeNS("http://www.w3.org/XML/1998/namespace", "lang");
        return new ImportedTask(id, item.getAttribute("title"), language, prompt.toString(), ref.timeLimitSeconds(),
                wordsMin, wordsMax, warnings, policies, labels, rubric);
    }

    private ObjectNode policy(Element m) {
        ObjectNode tools = yaml.createObjectNode();
        tools.put("spelling", m.getAttribute("spelling"));
        if (m.hasAttribute("glossary")) {
            tools.put("glossary", m.getAttribute("glossary"));
        }
        if (m.hasAttribute("dictionary")) {
            tools.put("dictionary", m.getAttribute("dictionary"));
        }
        tools.put("insertFromPanel", Boolean.parseBoolean(m.getAttribute("insert-from-panel")));
        tools.put("showWordCount", Boolean.parseBoolean(m.getAttribute("show-word-count")));
        tools.put("paste", m.getAttribute("paste"));
        return tools;
    }

    /** A tools node with exam.yaml's defaults filled in, so that two ways of writing one policy compare equal. */
    private ObjectNode normalTools(JsonNode tools) {
        ObjectNode out = yaml.createObjectNode();
        out.put("spelling", tools != null && tools.has("spelling") ? tools.get("spelling").asText() : "off");
        for (String pack : List.of("glossary", "dictionary")) {
            if (tools != null && tools.has(pack)) {
                out.put(pack, tools.get(pack).asText());
            }
        }
        out.put("insertFromPanel", tools != null && tools.has("insertFromPanel") && tools.get("insertFromPanel").asBoolean());
        out.put("showWordCount", tools == null || !tools.has("showWordCount") || tools.get("showWordCount").asBoolean());
        out.put("paste", tools != null && tools.has("paste") ? tools.get("paste").asText() : "none");
        return out;
    }

    private void write(Path folder, String examId, String title, String instructions, int sittingLimit,
            List<ImportedTask> tasks) throws IOException, ImportRefusal {
        JsonNode settings = yaml.createObjectNode();
        Optional<byte[]> settingsFile = files.file(QtiNames.SETTINGS_FILE);
        if (settingsFile.isPresent()) {
            try {
                settings = yaml.readTree(settingsFile.get());
            } catch (IOException e) {
                throw new ImportRefusal(QtiNames.SETTINGS_FILE + " is not readable YAML: " + e.getMessage());
            }
            if (settings == null || !settings.isObject()) {
                throw new ImportRefusal(QtiNames.SETTINGS_FILE + " does not hold exam settings");
            }
        }
        Files.createDirectories(folder.resolve("prompts"));
        ObjectNode exam = yaml.createObjectNode();
        exam.put("id", examId);
        exam.put("title", title == null || title.isBlank() ? examId : title);
        String language = tasks.stream().map(ImportedTask::language).filter(l -> !l.isEmpty()).findFirst().orElse(null);
        if (language == null) {
            language = "en";
            notes.add("no language (xml:lang) in the items; en written, change it in exam.yaml");
        }
        exam.put("language", language);
        if (instructions != null) {
            Files.writeString(folder.resolve("instructions.md"), instructions, StandardCharsets.UTF_8);
            exam.put("instructions", "instructions.md");
        }
        exam.put("practice", settings.path("practice").asBoolean(false));
        ArrayNode taskList = exam.putArray("tasks");
        ObjectNode rubric = null;
        for (ImportedTask t : tasks) {
            ObjectNode n = taskList.addObject();
            n.put("id", t.id());
            n.put("title", t.title().isBlank() ? t.id() : t.title());
            n.put("prompt", "prompts/" + t.id() + ".md");
            int minutes = (t.timeLimitSeconds() + 59) / 60;
            if (minutes * 60 != t.timeLimitSeconds()) {
                notes.add("task " + t.id() + ": time limit " + t.timeLimitSeconds() + " s rounded up to " + minutes + " min");
            }
            n.put("timeLimitMinutes", minutes);
            if (!t.warnings().isEmpty()) {
                ArrayNode w = n.putArray("warningMinutes");
                t.warnings().forEach(w::add);
            }
            if (t.wordsMax() != null) {
                ObjectNode words = n.putObject("words");
                words.put("min", t.wordsMin() == null ? 0 : t.wordsMin());
                words.put("max", t.wordsMax());
            }
            Files.writeString(folder.resolve("prompts/" + t.id() + ".md"), t.prompt(), StandardCharsets.UTF_8);
            if (t.rubric() != null) {
                if (rubric == null) {
                    rubric = t.rubric();
                } else if (!rubric.equals(t.rubric())) {
                    notes.add("task " + t.id() + ": its rubric differs from the first item's; Inkgate has one rubric per"
                            + " exam, the first was kept");
                }
            }
        }
        exam.set("conditions", conditions(settings, tasks));
        if (settings.has("design")) {
            exam.set("design", settings.get("design"));
        } else {
            ObjectNode design = exam.putObject("design");
            design.put("kind", "latin-square");
            design.put("rotateConditions", true);
            if (sittingLimit > 0) {
                design.put("sittingLimitMinutes", (sittingLimit + 59) / 60);
            }
            notes.add("no Inkgate settings in the package: design latin-square written; check it in exam.yaml");
        }
        for (String key : List.of("questionnaires", "packs")) {
            if (settings.has(key)) {
                exam.set(key, settings.get(key));
            }
        }
        for (JsonNode pack : settings.path("packs")) {
            String file = pack.path("file").asText();
            Optional<String> inside = PackageFiles.resolve(QtiNames.SETTINGS_FILE, file);
            byte[] bytes = inside.flatMap(files::file).orElse(null);
            if (bytes == null || org.inkgate.format.archive.EntryNames.problem(file) != null) {
                notes.add("pack file " + printable(file) + " is not in the package; copy it into the exam folder");
                continue;
            }
            Path target = folder.resolve(file).normalize();
            if (!target.startsWith(folder.normalize())) {
                throw new ImportRefusal("pack file " + printable(file) + " would lie outside the exam folder");
            }
            Files.createDirectories(target.getParent());
            Files.write(target, bytes);
        }
        if (rubric != null) {
            Files.writeString(folder.resolve("rubric.yaml"), yaml.writeValueAsString(rubric), StandardCharsets.UTF_8);
            exam.put("rubric", "rubric.yaml");
        } else {
            notes.add("no rubric for scorers in the package; add rubric.yaml before rating");
        }
        Files.writeString(folder.resolve(ExamSourceReader.EXAM_FILE), "# Imported from " + printable(files.source())
                + " by inkgate-admin qti import.\n" + yaml.writeValueAsString(exam), StandardCharsets.UTF_8);
    }

    /** The settings' conditions, with a task's own policy where its item says something else; or the items' own. */
    private ArrayNode conditions(JsonNode settings, List<ImportedTask> tasks) {
        ArrayNode out = yaml.createArrayNode();
        if (settings.has("conditions")) {
            for (JsonNode c : settings.get("conditions")) {
                ObjectNode condition = c.deepCopy();
                String id = c.path("id").asText();
                for (ImportedTask t : tasks) {
                    ObjectNode fromItem = t.policies().get(id);
                    if (fromItem == null) {
                        continue;
                    }
                    JsonNode expected = c.path("perTask").has(t.id()) ? c.path("perTask").get(t.id()) : c.get("tools");
                    if (!normalTools(expected).equals(normalTools(fromItem))) {
                        ObjectNode perTask = condition.has("perTask") ? (ObjectNode) condition.get("perTask")
                                : condition.putObject("perTask");
                        perTask.set(t.id(), fromItem);
                        notes.add("task " + t.id() + " under condition " + id + ": the item's resource policy differs from"
                                + " the exam settings; the item's was kept");
                    }
                }
                out.add(condition);
            }
            return out;
        }
        Map<String, String> labels = new LinkedHashMap<>();
        tasks.forEach(t -> labels.putAll(t.conditionLabels()));
        if (labels.isEmpty()) {
            ObjectNode c = out.addObject();
            c.put("id", "as-imported");
            c.put("label", "As imported");
            ObjectNode tools = c.putObject("tools");
            tools.put("spelling", "off");
            tools.put("paste", "none");
            notes.add("the package says nothing about writing tools: one condition as-imported with no tools written;"
                    + " edit conditions in exam.yaml");
            return out;
        }
        for (var e : labels.entrySet()) {
            ObjectNode c = out.addObject();
            c.put("id", e.getKey());
            c.put("label", e.getValue());
            ObjectNode first = tasks.get(0).policies().get(e.getKey());
            c.set("tools", first == null ? yaml.createObjectNode() : first);
            for (ImportedTask t : tasks.subList(1, tasks.size())) {
                ObjectNode own = t.policies().get(e.getKey());
                if (own != null && !normalTools(own).equals(normalTools(first))) {
                    (c.has("perTask") ? (ObjectNode) c.get("perTask") : c.putObject("perTask")).set(t.id(), own);
                }
            }
        }
        return out;
    }

    // ------------------------------------------------------------------ XML helpers

    private Document parse(String where, byte[] bytes) throws ImportRefusal {
        try {
            return SafeXml.parse(where, bytes);
        } catch (SafeXml.XmlRefusal e) {
            throw new ImportRefusal(e.getMessage());
        }
    }

    private int seconds(Element timeLimits, String where) throws ImportRefusal {
        String max = attribute(timeLimits, "max-time", "maxTime");
        if (max.isEmpty()) {
            return 0;
        }
        try {
            double s = Double.parseDouble(max);
            if (s < 0 || s > 600 * 60) {
                throw new NumberFormatException();
            }
            return (int) Math.ceil(s);
        } catch (NumberFormatException e) {
            throw new ImportRefusal(where + ": time limit " + printable(max) + " is not a number of seconds up to 10 hours");
        }
    }

    private static int integer(String s, String where) throws ImportRefusal {
        try {
            return Integer.parseInt(s.trim());
        } catch (NumberFormatException e) {
            throw new ImportRefusal(where + ": " + printable(s) + " is not a whole number");
        }
    }

    private String id(String raw, String what) throws ImportRefusal {
        if (raw.matches(ID)) {
            return raw;
        }
        String made = raw.replaceAll("[^A-Za-z0-9._-]", "-").replaceAll("^[^A-Za-z0-9]+", "");
        made = made.length() > 64 ? made.substring(0, 64) : made;
        if (made.isEmpty()) {
            throw new ImportRefusal(what + " " + printable(raw) + " cannot become an Inkgate id");
        }
        notes.add(what + " " + printable(raw) + " became id " + made + " (Inkgate ids: letters, digits, . - _)");
        return made;
    }


}
