package org.inkgate.packs.broker;

import java.util.Optional;
import java.util.Set;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.SpellingChecker;

/**
 * The tools of one task, and nothing else: a tool the task's policy forbids is empty here
 * because it was never constructed. Closing closes every tool.
 */
public final class TaskTools implements AutoCloseable {
    private final ResourcePolicy policy;
    private final SpellingChecker spelling;
    private final Glossary glossary;
    private final Dictionary dictionary;

    TaskTools(ResourcePolicy policy, SpellingChecker spelling, Glossary glossary, Dictionary dictionary) {
        this.policy = policy;
        this.spelling = spelling;
        this.glossary = glossary;
        this.dictionary = dictionary;
    }

    /** The policy these tools were handed out under (record it with the response). */
    public ResourcePolicy policy() {
        return policy;
    }

    /** The tools offered, as the policy states them. */
    public Set<Tool> offered() {
        return policy.offeredTools();
    }

    /** The spelling (and grammar, if allowed) checker, when the task allows checking. */
    public Optional<SpellingChecker> spelling() {
        return Optional.ofNullable(spelling);
    }

    /** The glossary the task names, if any. */
    public Optional<Glossary> glossary() {
        return Optional.ofNullable(glossary);
    }

    /** The dictionary the task names, if any. */
    public Optional<Dictionary> dictionary() {
        return Optional.ofNullable(dictionary);
    }

    @Override
    public void close() {
        try {
            if (spelling != null) {
                spelling.close();
            }
        } finally {
            try {
                if (glossary != null) {
                    glossary.close();
                }
            } finally {
                if (dictionary != null) {
                    dictionary.close();
                }
            }
        }
    }
}
