package org.inkgate.admin.core.testutil;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Invented exam source folders for tests: a valid one with two tasks, two conditions, a small
 * invented glossary pack and a rubric; tests edit the files to break them.
 */
public final class ExamFolders {

    public static final byte[] PACK_BYTES = "invented test glossary pack: not a real pack format\n".getBytes(StandardCharsets.UTF_8);

    private ExamFolders() {
    }

    public static Path valid(Path dir) throws IOException {
        return withTasks(dir, 2, 2, "latin-square", true);
    }

    /** A valid folder with {@code tasks} tasks and {@code conditions} conditions. */
    public static Path withTasks(Path dir, int tasks, int conditions, String design, boolean live) throws IOException {
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
        y.append("design:\n  kind: ").append(design).append("\n  rotateConditions: true\n  postQuestionnaire: after\n");
        y.append("questionnaires:\n");
        y.append("  - id: after\n    title: After writing\n    items:\n");
        y.append("      - id: q1\n        text: Invented question.\n        kind: likert\n        labels: [\"not at all\", maybe, \"very much\"]\n");
        y.append("packs:\n");
        y.append("  - id: test-glossary\n    kind: glossary\n    version: \"0.1\"\n    file: packs/test-glossary.inkpack\n");
        y.append("rubric: rubric.yaml\n");
        Files.writeString(dir.resolve("exam.yaml"), y.toString());
        Files.writeString(dir.resolve("instructions.md"), "# Invented instructions\n");
        Files.write(dir.resolve("packs/test-glossary.inkpack"), PACK_BYTES);
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
