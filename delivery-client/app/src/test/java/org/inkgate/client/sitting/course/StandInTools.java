package org.inkgate.client.sitting.course;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import org.inkgate.client.sitting.tools.ToolSupply;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.packs.broker.ResourceBroker;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.broker.ToolFactory;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingChecker;

/**
 * Tools for the course's tests: each task gets an empty tool set from the real broker (no pack is
 * opened), at once or, with {@link #holdBack}, when the test releases them.
 */
final class StandInTools implements ToolSupply {

    boolean holdBack;
    boolean cleared;
    private boolean started;
    private final List<CompletableFuture<TaskTools>> held = new ArrayList<>();

    @Override
    public CompletableFuture<Void> prepare(FormSpec form) {
        started = true;
        return CompletableFuture.completedFuture(null);
    }

    @Override
    public boolean started() {
        return started;
    }

    @Override
    public CompletableFuture<TaskTools> take(String taskId) {
        if (!started) {
            throw new IllegalStateException("taken before prepared");
        }
        if (holdBack) {
            CompletableFuture<TaskTools> later = new CompletableFuture<>();
            held.add(later);
            return later;
        }
        return CompletableFuture.completedFuture(noTools());
    }

    /** Hands out the tools held back; a task that ended meanwhile must close them. */
    void release() {
        holdBack = false;
        for (CompletableFuture<TaskTools> later : held) {
            later.complete(noTools());
        }
    }

    @Override
    public void clear() {
        cleared = true;
        started = false;
    }

    @Override
    public void close() {
    }

    private static TaskTools noTools() {
        try {
            return new ResourceBroker(NO_FACTORY).toolsFor(ResourcePolicy.noTools(), EnglishVariant.EN_GB, List.of());
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    /** The broker never asks it: the policy offers no tool. */
    private static final ToolFactory NO_FACTORY = new ToolFactory() {
        @Override
        public SpellingChecker spellingChecker(EnglishVariant variant, SpellingMode mode, Collection<String> examWords) {
            throw new AssertionError("no tool is offered");
        }

        @Override
        public Glossary glossary(String packId) {
            throw new AssertionError("no tool is offered");
        }

        @Override
        public Dictionary dictionary(String packId) {
            throw new AssertionError("no tool is offered");
        }
    };
}
