package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.Collection;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.BiFunction;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.broker.PackCatalogue;
import org.inkgate.packs.broker.PackToolFactory;
import org.inkgate.packs.broker.ResourceBroker;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.broker.ToolFactory;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingChecker;

/** Real packs (built by the resource-packs module), a counting factory, and task contexts for the workspace tests. */
final class TestTools {

    static final String GLOSSARY = "demo-ferry-en-es";
    static final String DICTIONARY = "wordnet-3.1-en";
    /** An invented task for the tests. */
    static final TaskSpec TASK = new TaskSpec("harbour-letter", "A letter about the harbour", "prompts/harbour.md", 1200,
            List.of(5, 1), new WordGuidance(80, 120));
    static final String PROMPT = """
            # A letter about the harbour

            The town council of an invented island plans to replace the old ferry. Write a letter
            to the council saying what you think.

            - say what the ferry means to you
            - suggest one change
            """;

    private TestTools() {
    }

    static Path packs() {
        return Path.of(System.getProperty("inkgate.packs.dir", "../../resource-packs/target/packs"));
    }

    static Path pack(String name) {
        Path p = packs().resolve(name);
        assertTrue(Files.isRegularFile(p), p.toAbsolutePath() + " is missing: build resource-packs through process-classes first "
                + "(mvn -pl delivery-client/app -am verify builds it)");
        return p;
    }

    static Path work() {
        return Path.of(System.getProperty("inkgate.tmpdir", System.getProperty("java.io.tmpdir")));
    }

    /** The real packs, each verified on open. */
    static ToolFactory realPacks() {
        return new PackToolFactory(PackCatalogue.of(Map.of(GLOSSARY, pack("demo-ferry-en-es.inkpack"),
                DICTIONARY, pack("wordnet-3.1-en.inkpack"))), work(), Clock.systemUTC());
    }

    /** Counts every construction per tool; checkers come from the given maker. */
    static final class CountingFactory implements ToolFactory {
        final Map<Tool, Integer> built = new EnumMap<>(Tool.class);
        private final ToolFactory packs;
        private final BiFunction<SpellingMode, Collection<String>, SpellingChecker> checkers;

        CountingFactory(ToolFactory packs, BiFunction<SpellingMode, Collection<String>, SpellingChecker> checkers) {
            this.packs = packs;
            this.checkers = checkers;
        }

        @Override
        public SpellingChecker spellingChecker(EnglishVariant variant, SpellingMode mode, Collection<String> examWords) {
            built.merge(Tool.SPELLING, 1, Integer::sum);
            if (mode.checksGrammar()) {
                built.merge(Tool.GRAMMAR, 1, Integer::sum);
            }
            return checkers.apply(mode, examWords);
        }

        @Override
        public Glossary glossary(String packId) throws PackRefusal {
            built.merge(Tool.GLOSSARY, 1, Integer::sum);
            return packs.glossary(packId);
        }

        @Override
        public Dictionary dictionary(String packId) throws PackRefusal {
            built.merge(Tool.DICTIONARY, 1, Integer::sum);
            return packs.dictionary(packId);
        }
    }

    static TaskTools toolsFor(ResourcePolicy policy, ToolFactory factory) throws PackRefusal {
        return new ResourceBroker(factory).toolsFor(policy, EnglishVariant.EN_GB, List.of());
    }

    static TaskContext context(TaskTools tools, RecordingLog log, String start, DisplaySettings display) {
        return new TaskContext(TASK, PROMPT, tools, log, start, start.length(), display);
    }
}
