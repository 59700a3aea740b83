package org.inkgate.packs.broker;

import java.util.Collection;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingChecker;

/**
 * Constructs tools. Only the {@link ResourceBroker} calls it, and only for tools the task's
 * policy allows; tests substitute a counting factory to prove that.
 */
public interface ToolFactory {
    /** A checker for a mode other than OFF. */
    SpellingChecker spellingChecker(EnglishVariant variant, SpellingMode mode, Collection<String> examWords);

    /** The glossary pack with this id, verified on open. */
    Glossary glossary(String packId) throws PackRefusal;

    /** The dictionary pack with this id, verified on open. */
    Dictionary dictionary(String packId) throws PackRefusal;
}
