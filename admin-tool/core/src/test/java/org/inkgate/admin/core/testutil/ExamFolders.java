package org.inkgate.admin.core.testutil;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.inkgate.packs.glossary.GlossaryEntry;
import org.inkgate.packs.glossary.GlossaryImportException;
import org.inkgate.packs.glossary.GlossaryPacks;
import org.inkgate.packs.pack.PackRefusal;

/**
 * Invented exam source folders for tests: a valid one with two tasks, two conditions, a small
 * invented glossary pack and a rubric; tests edit the files to break them.
 */
public final class ExamFolders {

    /** An invented two-entry term bank in the resource-packs CSV columns (docs/resource-packs.md). */
    private static final String GLOSSARY_CSV = """
            entry_id,language,term,part_of_speech,definition,example,subject_field,note
            g1,en,harbour master,noun,An invented definition for tests.,,invented,
            g1,es,capitán de puerto,noun,,,invented,
            g2,en,mooring,noun,Another invented definition.,,invented,
            """;

    private ExamFolders() {
    }

    /** Builds a real glossary pack with the resource-packs builder, as a test owner would. */
    public static void writeGlossaryPack(Path target, String id, String version) throws IOException {
        Path work = target.getParent();
        Path csv = work.resolve(id + "-source.csv");
        Files.writeString(csv, GLOSSARY_CSV, StandardCharsets.UTF_8);
        try {
            List<GlossaryEntry> entries = GlossaryPacks.importFile(csv);
            GlossaryPacks.build(entries, new GlossaryPacks.Metadata(id, version, "Invented test glossary",
                    "invented for tests", "invented for tests", Instant.parse("2026-01-01T00:00:00Z")), target, work);
        } catch (GlossaryImportException | PackRefusal e) {
            throw new IllegalStateException("the invented test glossary did not build", e);
        } finally {
            Files.deleteIfExists(csv);
        }
    }

    public static Path valid(Path dir) throws IOException {
        return withTasks(dir, 2, 2, "latin-square", true);
    }

    /** A valid folder with {@code tasks} tasks and {@code conditions} conditions. */
    public static Path withTasks(Path dir, int tasks, int conditions, String design, boolean live) throws IOException {
        return withDesign(dir, tasks, conditions, "  kind: " + design + "\n"
                + (design.equals("parallel") ? "" : "  rotateConditions: true\n"), live);
    }

    /**
     * A folder with {@code tasks} tasks, {@code conditions} conditions and the design block's lines
     * as given (indented two spaces, each ending in a line break; the post-questionnaire is added).
     */
    public static Path withDesign(Path dir, int tasks, int conditions, String designLines, boolean live)
            throws IOException {
        Files.createDirectories(dir.resolve("prompts"));
        Files.createDirectories(dir.resolve("packs"));
        StringBuilder y = new StringBuilder();
        y.append("id: test-exam\n");
        y.append("title: Invented test exam\n");
        y.append("language: en-GB\n");
        y.append("instructions: instructions.md\n");
        y.append("practice: ").append(!live).append('\n');
        y.append("tasks:\n");
        for (int t = 1; t <= tasks; t++) {
            y.append("  - id: t").append(t).append('\n');
            y.append("    title: Invented task ").append(t).append('\n');
            y.append("    prompt: prompts/t").append(t).append(".md\n");
            y.append("    timeLimitMinutes: 20\n");
            y.append("    warningMinutes: [5, 1]\n");
            y.append("    words: {min: 100, max: 150}\n");
            Files.writeString(dir.resolve("prompts/t" + t + ".md"), "Invented prompt " + t + ".\n");
        }
        y.append("conditions:\n");
        for (int c = 1; c <= conditions; c++) {
            y.append("  - id: c").append(c).append('\n');
            y.append("    label: Invented condition ").append(c).append('\n');
            y.append("    tools:\n");
            if (c == 1) {
                y.append("      spelling: suggestions\n");
                y.append("      glossary: test-glossary\n");
            } else {
                y.append("      spelling: \"off\"\n");
            }
        }
        y.append("design:\n").append(designLines).append("  postQuestionnaire: after\n");
        y.append("questionnaires:\n");
        y.append("  - id: after\n    title: After writing\n    items:\n");
        y.append("      - id: q1\n        text: Invented question.\n        kind: likert\n        labels: [\"not at all\", maybe, \"very much\"]\n");
        y.append("packs:\n");
        y.append("  - id: test-glossary\n    kind: glossary\n    version: \"0.1\"\n    file: packs/test-glossary.inkpack\n");
        y.append("rubric: rubric.yaml\n");
        Files.writeString(dir.resolve("exam.yaml"), y.toString());
        Files.writeString(dir.resolve("instructions.md"), "# Invented instructions\n");
        writeGlossaryPack(dir.resolve("packs/test-glossary.inkpack"), "test-glossary", "0.1");
        Files.writeString(dir.resolve("rubric.yaml"), """
                criteria:
                  - id: content
                    name: Content
                    scores: 1-9
                    bands:
                      - scores: 1-3
                        descriptor: Invented low band.
                      - scores: 4-6
                        descriptor: Invented middle band.
                      - scores: 7-9
                        descriptor: Invented high band.
                """);
        return dir;
    }
}
