package org.inkgate.packs.broker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CompletableFuture;
import java.util.stream.Stream;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.event.ToolEvent;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.CheckResult;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingChecker;
import org.inkgate.packs.testutil.BuiltPacks;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The broker constructs exactly the tools a policy allows, for every combination of spelling
 * mode, glossary and dictionary; and the task's tools have no other public way in.
 */
class ResourceBrokerTest {
    static final String GLOSSARY = "demo-ferry-en-es";
    static final String DICTIONARY = "wordnet-3.1-en";
    @TempDir
    Path work;

    /** Counts every construction per tool; spelling checkers are stand-ins so LanguageTool need not start 16 times. */
    static final class CountingFactory implements ToolFactory {
        final Map<Tool, Integer> built = new EnumMap<>(Tool.class);
        final List<SpellingMode> modes = new ArrayList<>();
        final List<StandInChecker> checkers = new ArrayList<>();
        final ToolFactory packs;

        CountingFactory(ToolFactory packs) {
            this.packs = packs;
        }

        private void count(Tool t) {
            built.merge(t, 1, Integer::sum);
        }

        @Override
        public SpellingChecker spellingChecker(EnglishVariant variant, SpellingMode mode, Collection<String> examWords) {
            count(Tool.SPELLING);
            if (mode.checksGrammar()) {
                count(Tool.GRAMMAR);
            }
            modes.add(mode);
            StandInChecker c = new StandInChecker(mode);
            checkers.add(c);
            return c;
        }

        @Override
        public Glossary glossary(String packId) throws PackRefusal {
            count(Tool.GLOSSARY);
            return packs.glossary(packId);
        }

        @Override
        public Dictionary dictionary(String packId) throws PackRefusal {
            count(Tool.DICTIONARY);
            return packs.dictionary(packId);
        }
    }

    static final class StandInChecker implements SpellingChecker {
        final SpellingMode mode;
        boolean closed;

        StandInChecker(SpellingMode mode) {
            this.mode = mode;
        }

        @Override public SpellingMode mode() { return mode; }
        @Override public EnglishVariant variant() { return EnglishVariant.EN_GB; }
        @Override public CompletableFuture<Void> warmUp() { return CompletableFuture.completedFuture(null); }
        @Override public CompletableFuture<CheckResult> check(String text) { throw new UnsupportedOperationException("stand-in"); }
        @Override public ToolEvent ignoreWord(String word) { throw new UnsupportedOperationException("stand-in"); }
        @Override public Set<String> ignoredWords() { return Set.of(); }
        @Override public void close() { closed = true; }
    }

    private PackToolFactory realPacks() {
        return new PackToolFactory(PackCatalogue.of(Map.of(GLOSSARY, BuiltPacks.demoGlossary(), DICTIONARY, BuiltPacks.wordnet())),
                work, Clock.systemUTC());
    }

    static Stream<Arguments> everyPolicy() {
        List<Arguments> out = new ArrayList<>();
        for (SpellingMode mode : SpellingMode.values()) {
            for (String g : Arrays.asList(null, GLOSSARY)) {
                for (String d : Arrays.asList(null, DICTIONARY)) {
                    out.add(Arguments.of(new ResourcePolicy(mode, g, d, false, true, PastePolicy.NONE)));
                }
            }
        }
        return out.stream();
    }

    @ParameterizedTest
    @MethodSource("everyPolicy")
    void toolsFor_everyPolicy_constructsExactlyTheAllowedTools(ResourcePolicy policy) throws Exception {
        CountingFactory factory = new CountingFactory(realPacks());
        try (TaskTools tools = new ResourceBroker(factory).toolsFor(policy, EnglishVariant.EN_GB, List.of())) {
            for (Tool t : Tool.values()) {
                assertEquals(policy.allows(t) ? 1 : 0, factory.built.getOrDefault(t, 0), t + " under " + policy);
            }
            assertEquals(policy.allows(Tool.SPELLING), tools.spelling().isPresent());
            assertEquals(policy.allows(Tool.GLOSSARY), tools.glossary().isPresent());
            assertEquals(policy.allows(Tool.DICTIONARY), tools.dictionary().isPresent());
            tools.spelling().ifPresent(c -> assertEquals(policy.spelling(), c.mode(), "the checker never does more than the mode"));
            assertEquals(policy.offeredTools(), tools.offered());
            // every public accessor of TaskTools that returns a tool returns one only when allowed
            for (Method m : TaskTools.class.getMethods()) {
                if (m.getDeclaringClass() == TaskTools.class && m.getReturnType() == Optional.class) {
                    Optional<?> tool = (Optional<?>) m.invoke(tools);
                    Tool which = switch (m.getName()) {
                        case "spelling" -> Tool.SPELLING;
                        case "glossary" -> Tool.GLOSSARY;
                        case "dictionary" -> Tool.DICTIONARY;
                        default -> throw new AssertionError("unexpected accessor " + m);
                    };
                    assertEquals(policy.allows(which), tool.isPresent(), m.getName());
                }
            }
        }
    }

    @Test
    void taskTools_hasNoOtherPublicWayToATool() {
        assertEquals(0, TaskTools.class.getConstructors().length, "TaskTools is made only by the broker");
        Set<String> methods = new TreeSet<>();
        for (Method m : TaskTools.class.getDeclaredMethods()) {
            if (Modifier.isPublic(m.getModifiers())) {
                methods.add(m.getName());
            }
        }
        assertEquals(Set.of("close", "dictionary", "glossary", "offered", "policy", "spelling"), methods);
        assertTrue(Arrays.stream(TaskTools.class.getDeclaredFields()).noneMatch(f -> Modifier.isPublic(f.getModifiers())));
        assertTrue(Modifier.isFinal(TaskTools.class.getModifiers()));
        Set<String> broker = new TreeSet<>();
        for (Method m : ResourceBroker.class.getDeclaredMethods()) {
            if (Modifier.isPublic(m.getModifiers())) {
                broker.add(m.getName());
            }
        }
        assertEquals(Set.of("toolsFor"), broker);
    }

    @Test
    void toolsFor_missingPack_refusesAndClosesWhatWasBuilt() {
        CountingFactory factory = new CountingFactory(realPacks());
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.SUGGESTIONS, "no-such-pack", null, false, true, PastePolicy.NONE);
        PackRefusal r = assertThrows(PackRefusal.class, () -> new ResourceBroker(factory).toolsFor(policy, EnglishVariant.EN_US, List.of()));
        assertEquals(PackRefusal.Reason.WRONG_PACK, r.reason());
        assertTrue(factory.checkers.get(0).closed, "the checker built before the refusal is closed");
    }

    @Test
    void toolsFor_packOfTheWrongKind_isRefused() {
        ToolFactory swapped = new PackToolFactory(PackCatalogue.of(Map.of(GLOSSARY, BuiltPacks.wordnet())), work, Clock.systemUTC());
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.OFF, GLOSSARY, null, false, true, PastePolicy.NONE);
        PackRefusal r = assertThrows(PackRefusal.class, () -> new ResourceBroker(swapped).toolsFor(policy, EnglishVariant.EN_US, List.of()));
        assertEquals(PackRefusal.Reason.WRONG_PACK, r.reason());
    }

    @Test
    void toolsFor_damagedPack_isRefusedBeforeAnyToolIsHandedOut() throws Exception {
        Path copy = work.resolve("damaged.inkpack");
        byte[] bytes = Files.readAllBytes(BuiltPacks.demoGlossary());
        bytes[bytes.length / 2] ^= 0x20; // flip one bit inside the compressed contents
        Files.write(copy, bytes);
        ToolFactory f = new PackToolFactory(PackCatalogue.of(Map.of(GLOSSARY, copy)), work.resolve("open"), Clock.systemUTC());
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.OFF, GLOSSARY, null, false, true, PastePolicy.NONE);
        assertThrows(PackRefusal.class, () -> new ResourceBroker(f).toolsFor(policy, EnglishVariant.EN_US, List.of()));
        try (var left = Files.list(work.resolve("open"))) {
            assertEquals(0, left.count(), "nothing of the damaged pack is left extracted");
        }
    }
}
