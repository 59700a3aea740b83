package org.inkgate.format.testutil;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.ConditionSpec;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.OwnerKeys;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;

/** A small valid exam for format tests: two tasks crossed with two conditions in two forms. */
public final class SampleExam {

    public static final ResourcePolicy WITH_TOOLS =
            new ResourcePolicy(SpellingMode.SUGGESTIONS, null, null, false, true, PastePolicy.WITHIN_RESPONSE);

    private SampleExam() {
    }

    public static BundleManifest manifest() {
        return manifest(TestKeys.ownerKeys(), true);
    }

    public static BundleManifest manifest(OwnerKeys keys, boolean practice) {
        List<TaskSpec> tasks = List.of(
                new TaskSpec("t1", "A note", "prompts/t1.md", 1200, List.of(5), new WordGuidance(60, 120)),
                new TaskSpec("t2", "An opinion", "prompts/t2.md", 1800, List.of(5, 1), new WordGuidance(100, 180)));
        List<ConditionSpec> conditions = List.of(new ConditionSpec("with", "with resources"),
                new ConditionSpec("without", "without resources"));
        List<FormSpec> forms = List.of(
                new FormSpec("A", List.of(new FormSlot("t1", "with", WITH_TOOLS),
                        new FormSlot("t2", "without", ResourcePolicy.noTools())), null, "after", 0),
                new FormSpec("B", List.of(new FormSlot("t1", "without", ResourcePolicy.noTools()),
                        new FormSlot("t2", "with", WITH_TOOLS)), null, "after", 0));
        List<QuestionnaireSpec> questionnaires = List.of(new QuestionnaireSpec("after", "After writing",
                List.of(new QuestionItem("q1", "The tools helped me.", QuestionItem.Kind.LIKERT,
                        List.of("disagree", "neutral", "agree")))));
        List<RosterEntry> roster = List.of(new RosterEntry("1001", "A", 0, false, false),
                new RosterEntry("1002", "B", 25, true, false));
        return new BundleManifest(BundleManifest.FORMAT, BundleManifest.SCHEMA_VERSION, "sample-exam", "Sample exam",
                "en-GB", "instructions.md", tasks, conditions, forms, questionnaires, List.of(), roster, keys,
                null, null, practice, Map.of());
    }

    public static Map<String, byte[]> contents() {
        Map<String, byte[]> contents = new LinkedHashMap<>();
        contents.put("instructions.md", utf8("# Instructions\n\nWrite in full sentences.\n"));
        contents.put("prompts/t1.md", utf8("Write a short note to a friend about a change of plan.\n"));
        contents.put("prompts/t2.md", utf8("Should the town library open on Sundays? Give your view.\n"));
        return contents;
    }

    private static byte[] utf8(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }
}
