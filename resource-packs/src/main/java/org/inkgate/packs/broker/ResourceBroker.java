package org.inkgate.packs.broker;

import java.util.Collection;
import java.util.List;
import java.util.Objects;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingChecker;

/**
 * Hands out the tools one task's resource policy allows, constructing only those. This is the
 * client's only way to a writing tool: a tool the policy forbids is never built for the task,
 * so no shortcut, menu or hidden path in the UI can reach it.
 */
public final class ResourceBroker {
    private final ToolFactory factory;

    public ResourceBroker(ToolFactory factory) {
        this.factory = Objects.requireNonNull(factory, "factory");
    }

    /**
     * The tools of one task.
     *
     * @param policy     the task's resource policy
     * @param variant    the exam's English variant (used only when checking is allowed)
     * @param examWords  names and terms of the prompts the checker must accept
     * @throws PackRefusal when a pack the policy names is missing, damaged, altered or of the wrong kind;
     *                     then no tool is handed out (those already built are closed)
     */
    public TaskTools toolsFor(ResourcePolicy policy, EnglishVariant variant, Collection<String> examWords) throws PackRefusal {
        Objects.requireNonNull(policy, "policy");
        SpellingChecker spelling = null;
        Glossary glossary = null;
        Dictionary dictionary = null;
        try {
            if (policy.allows(Tool.SPELLING)) {
                spelling = factory.spellingChecker(variant, policy.spelling(), examWords == null ? List.of() : examWords);
            }
            if (policy.allows(Tool.GLOSSARY)) {
                glossary = factory.glossary(policy.glossaryPack());
            }
            if (policy.allows(Tool.DICTIONARY)) {
                dictionary = factory.dictionary(policy.dictionaryPack());
            }
            return new TaskTools(policy, spelling, glossary, dictionary);
        } catch (PackRefusal | RuntimeException e) {
            new TaskTools(policy, spelling, glossary, dictionary).close();
            throw e;
        }
    }
}
