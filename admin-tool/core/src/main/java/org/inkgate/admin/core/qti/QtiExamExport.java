package org.inkgate.admin.core.qti;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLGenerator;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.format.archive.CanonicalZipWriter;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;

/**
 * An exam source as a QTI 3.0 content package (a ZIP in Inkgate's canonical profile, which standard
 * unzip tools open): {@code imsmanifest.xml}; {@code assessment-test.xml} with one test part, one
 * section per task holding the task's time limit, the sitting limit on the test and the general
 * instructions as a rubric block for candidates; one item per task in {@code items/} with the
 * prompt, an extended-text interaction with the expected length, the rubric as a rubric block for
 * scorers, and the task's resource policy under every condition in Inkgate's own namespace inside
 * {@code qti-companion-materials-info}; and {@code inkgate/exam-settings.yaml} (plus the packs) for
 * what QTI has no place for. Field by field: docs/formats.md, "Tasks as a QTI 3.0 content package".
 */
public final class QtiExamExport {

    /**
     * Characters per word used for QTI's {@code expected-length} (which counts characters) from the
     * task's maximum words: common practice for English prose (about five letters and a space; value
     * from memory, not from a corpus). The exact word range travels in {@code ink:word-guidance}.
     */
    public static final int CHARACTERS_PER_WORD = 6;

    /** What was written, and what of the source the package carries only in Inkgate's own files. */
    public record Report(int items, List<String> notes) {
        public Report {
            notes = List.copyOf(notes);
        }
    }

    private QtiExamExport() {
    }

    public static Report write(ExamSource exam, Path zip) throws IOException {
        List<String> notes = new ArrayList<>();
        Map<String, byte[]> entries = new LinkedHashMap<>();
        Map<String, String> itemFiles = new LinkedHashMap<>();
        for (ExamSource.Task task : exam.tasks()) {
            String file = "items/" + QtiIdentifier.encode(task.id()) + ".xml";
            itemFiles.put(task.id(), file);
            entries.put(file, item(exam, task, notes));
        }
        entries.put(QtiNames.TEST_FILE, test(exam, itemFiles, notes));
        entries.put(QtiNames.SETTINGS_FILE, settings(exam));
        List<String> packFiles = new ArrayList<>();
        for (ExamSource.Pack pack : exam.packs()) {
            String name = QtiNames.SETTINGS_FOLDER + pack.file();
            entries.put(name, Files.readAllBytes(exam.folder().resolve(pack.file())));
            packFiles.add(name);
        }
        byte[] manifest = manifest(exam, itemFiles, packFiles);
        Path tmp = zip.resolveSibling(zip.getFileName() + ".part");
        try (OutputStream out = Files.newOutputStream(tmp); CanonicalZipWriter w = new CanonicalZipWriter(out)) {
            w.addDeflated(QtiNames.MANIFEST_FILE, manifest);
            for (var e : entries.entrySet()) {
                if (e.getKey().endsWith(".inkpack")) {
                    w.addStored(e.getKey(), e.getValue());
                } else {
                    w.addDeflated(e.getKey(), e.getValue());
                }
            }
            w.finish();
        }
        Files.move(tmp, zip, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        return new Report(exam.tasks().size(), notes);
    }

    private static byte[] item(ExamSource exam, ExamSource.Task task, List<String> notes) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (Writer w = new OutputStreamWriter(bytes, StandardCharsets.UTF_8); XmlOut x = new XmlOut(w)) {
            x.start("qti-assessment-item").attribute("xmlns", QtiNames.ASI).attribute("xmlns:ink", QtiNames.INKGATE)
                    .attribute("identifier", QtiIdentifier.encode(task.id())).attribute("title", task.title())
                    .attribute("adaptive", "false").attribute("time-dependent", "true")
                    .attribute("xml:lang", exam.language()).attribute("tool-name", "Inkgate");
            x.start("qti-response-declaration").attribute("identifier", "RESPONSE").attribute("cardinality", "single")
                    .attribute("base-type", "string").end();
            if (exam.rubric() != null) {
                int min = exam.rubric().criteria().stream().mapToInt(ExamSource.Criterion::minScore).sum();
                int max = exam.rubric().criteria().stream().mapToInt(ExamSource.Criterion::maxScore).sum();
                x.start("qti-outcome-declaration").attribute("identifier", "SCORE").attribute("cardinality", "single")
                        .attribute("base-type", "float").attribute("external-scored", "human")
                        .attribute("normal-maximum", String.valueOf(max)).attribute("normal-minimum", String.valueOf(min))
                        .end();
            }
            x.start("qti-companion-materials-info");
            for (ExamSource.Condition c : exam.conditions()) {
                policy(x, c, c.policyFor(task.id()));
            }
            if (task.words() != null) {
                x.start("ink:word-guidance").attribute("min", String.valueOf(task.words().min()))
                        .attribute("max", String.valueOf(task.words().max())).end();
            }
            if (!task.warningMinutes().isEmpty()) {
                x.start("ink:time-warnings").attribute("minutes-before-end", task.warningMinutes().stream()
                        .map(String::valueOf).collect(Collectors.joining(" "))).end();
            }
            x.end();
            x.start("qti-item-body");
            if (exam.rubric() != null) {
                rubric(x, exam.rubric());
            }
            x.start("div").attribute("class", "inkgate-prompt");
            MarkdownBlocks.write(MarkdownBlocks.parse(read(exam, task.promptFile())), x);
            x.end();
            x.start("qti-extended-text-interaction").attribute("response-identifier", "RESPONSE").attribute("format", "plain");
            if (task.words() != null) {
                x.attribute("expected-length", String.valueOf(task.words().max() * CHARACTERS_PER_WORD));
            }
            x.end();
            x.end();
            x.end();
            if (x.replaced() > 0) {
                notes.add("task " + task.id() + ": " + x.replaced() + " characters XML 1.0 forbids were written as U+FFFD");
            }
        }
        return bytes.toByteArray();
    }

    private static void policy(XmlOut x, ExamSource.Condition c, ResourcePolicy p) throws IOException {
        x.start("ink:resource-policy").attribute("condition", c.id()).attribute("condition-label", c.label())
                .attribute("spelling", spelling(p.spelling())).attribute("glossary", p.glossaryPack())
                .attribute("dictionary", p.dictionaryPack())
                .attribute("insert-from-panel", String.valueOf(p.insertFromPanel()))
                .attribute("show-word-count", String.valueOf(p.showWordCount()))
                .attribute("paste", p.paste() == PastePolicy.WITHIN_RESPONSE ? "within-response" : "none").end();
    }

    /** The words exam.yaml uses for spelling modes (ExamSourceReader). */
    static String spelling(SpellingMode m) {
        return switch (m) {
            case OFF -> "off";
            case UNDERLINE_ONLY -> "underline-only";
            case SUGGESTIONS -> "suggestions";
            case SPELLING_AND_GRAMMAR -> "spelling-and-grammar";
        };
    }

    /** The rubric for scorers, in a layout {@link QtiExamImport} reads back by its class names. */
    private static void rubric(XmlOut x, ExamSource.Rubric rubric) throws IOException {
        x.start("qti-rubric-block").attribute("use", "scoring").attribute("view", "scorer");
        x.start("qti-content-body");
        for (ExamSource.Criterion c : rubric.criteria()) {
            x.start("div").attribute("class", "inkgate-criterion");
            x.start("p");
            x.start("span").attribute("class", "inkgate-criterion-name").text(c.name()).end();
            x.text(" (");
            x.start("span").attribute("class", "inkgate-criterion-id").text(c.id()).end();
            x.text("), scores ");
            x.start("span").attribute("class", "inkgate-scores").text(range(c.minScore(), c.maxScore())).end();
            x.end();
            x.start("ul");
            for (ExamSource.Band b : c.bands()) {
                x.start("li");
                x.start("span").attribute("class", "inkgate-band").text(range(b.from(), b.to())).end();
                x.text(": ");
                x.start("span").attribute("class", "inkgate-descriptor").text(b.descriptor()).end();
                x.end();
            }
            x.end();
            x.end();
        }
        x.end();
        x.end();
    }

    static String range(int from, int to) {
        return from == to ? String.valueOf(from) : from + "-" + to;
    }

    private static byte[] test(ExamSource exam, Map<String, String> itemFiles, List<String> notes) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (Writer w = new OutputStreamWriter(bytes, StandardCharsets.UTF_8); XmlOut x = new XmlOut(w)) {
            x.start("qti-assessment-test").attribute("xmlns", QtiNames.ASI)
                    .attribute("identifier", QtiIdentifier.encode(exam.examId())).attribute("title", exam.title())
                    .attribute("tool-name", "Inkgate");
            if (exam.design().sittingLimitSeconds() > 0) {
                x.start("qti-time-limits").attribute("max-time", String.valueOf(exam.design().sittingLimitSeconds())).end();
            }
            if (exam.instructionsFile() != null) {
                x.start("qti-rubric-block").attribute("use", "instructions").attribute("view", "candidate");
                x.start("qti-content-body");
                MarkdownBlocks.write(MarkdownBlocks.parse(read(exam, exam.instructionsFile())), x);
                x.end();
                x.end();
            }
            x.start("qti-test-part").attribute("identifier", "writing").attribute("navigation-mode", "linear")
                    .attribute("submission-mode", "individual");
            for (ExamSource.Task task : exam.tasks()) {
                String id = QtiIdentifier.encode(task.id());
                x.start("qti-assessment-section").attribute("identifier", "section-" + id).attribute("title", task.title())
                        .attribute("visible", "true");
                x.start("qti-time-limits").attribute("max-time", String.valueOf(task.timeLimitSeconds())).end();
                x.start("qti-assessment-item-ref").attribute("identifier", id).attribute("href", itemFiles.get(task.id()))
                        .end();
                x.end();
            }
            x.end();
            x.end();
        }
        if (exam.design().kind() != null) {
            notes.add("the form design (" + exam.design().kind().word() + "), the conditions and any questionnaires have"
                    + " no place in QTI: they travel in " + QtiNames.SETTINGS_FILE + "; the test lists the tasks in"
                    + " source order, each form's own order is made by inkgate-admin forms");
        }
        return bytes.toByteArray();
    }

    private static byte[] settings(ExamSource exam) throws IOException {
        YAMLMapper yaml = YAMLMapper.builder().disable(YAMLGenerator.Feature.WRITE_DOC_START_MARKER)
                .enable(YAMLGenerator.Feature.MINIMIZE_QUOTES).enable(YAMLGenerator.Feature.ALWAYS_QUOTE_NUMBERS_AS_STRINGS)
                .build();
        JsonNode source = yaml.readTree(exam.folder().resolve(ExamSourceReader.EXAM_FILE).toFile());
        ObjectNode out = yaml.createObjectNode();
        for (String key : List.of("practice", "conditions", "design", "questionnaires", "packs")) {
            if (source.has(key)) {
                out.set(key, source.get(key));
            }
        }
        String header = "# Exam settings QTI has no place for, in exam.yaml's own syntax (written by inkgate-admin qti"
                + " export-exam;\n# read by qti import). See docs/formats.md.\n";
        return (header + yaml.writeValueAsString(out)).getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] manifest(ExamSource exam, Map<String, String> itemFiles, List<String> packFiles)
            throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (Writer w = new OutputStreamWriter(bytes, StandardCharsets.UTF_8); XmlOut x = new XmlOut(w)) {
            x.start("manifest").attribute("xmlns", QtiNames.MANIFEST)
                    .attribute("identifier", "manifest-" + QtiIdentifier.encode(exam.examId()));
            x.start("metadata");
            x.element("schema", "QTI Package");
            x.element("schemaversion", "3.0.0");
            x.end();
            x.start("organizations").end();
            x.start("resources");
            x.start("resource").attribute("identifier", "test-" + QtiIdentifier.encode(exam.examId()))
                    .attribute("type", "imsqti_test_xmlv3p0").attribute("href", QtiNames.TEST_FILE);
            x.start("file").attribute("href", QtiNames.TEST_FILE).end();
            for (String task : itemFiles.keySet()) {
                x.start("dependency").attribute("identifierref", "item-" + QtiIdentifier.encode(task)).end();
            }
            x.end();
            for (var e : itemFiles.entrySet()) {
                x.start("resource").attribute("identifier", "item-" + QtiIdentifier.encode(e.getKey()))
                        .attribute("type", "imsqti_item_xmlv3p0").attribute("href", e.getValue());
                x.start("file").attribute("href", e.getValue()).end();
                x.end();
            }
            x.start("resource").attribute("identifier", "inkgate-settings")
                    .attribute("type", "associatedcontent/learning-application-resource")
                    .attribute("href", QtiNames.SETTINGS_FILE);
            x.start("file").attribute("href", QtiNames.SETTINGS_FILE).end();
            for (String pack : packFiles) {
                x.start("file").attribute("href", pack).end();
            }
            x.end();
            x.end();
            x.end();
        }
        return bytes.toByteArray();
    }

    private static String read(ExamSource exam, String file) throws IOException {
        return Files.readString(exam.folder().resolve(file), StandardCharsets.UTF_8);
    }
}
