package org.inkgate.packs.policy;

import java.util.EnumSet;
import java.util.Objects;
import java.util.Set;

/**
 * The tools one task offers under one condition, as the test owner set them. A bundle carries
 * one policy per task slot of each form, and a response carries the policy each task ran under.
 *
 * @param spelling        how much the spelling/grammar engine may do
 * @param glossaryPack    id of the glossary pack offered, or null for no glossary
 * @param dictionaryPack  id of the dictionary pack offered, or null for no dictionary
 * @param insertFromPanel whether text may be inserted from the resource panel into the answer
 * @param showWordCount   whether the live word count is shown
 * @param paste           what the editor may paste
 */
public record ResourcePolicy(
        SpellingMode spelling,
        String glossaryPack,
        String dictionaryPack,
        boolean insertFromPanel,
        boolean showWordCount,
        PastePolicy paste) {

    public ResourcePolicy {
        Objects.requireNonNull(spelling, "spelling mode must be set (use OFF for none)");
        Objects.requireNonNull(paste, "paste policy must be set (use NONE to forbid paste)");
        if (glossaryPack != null && glossaryPack.isBlank()) {
            throw new IllegalArgumentException("glossaryPack is blank: give a pack id or leave it out for no glossary");
        }
        if (dictionaryPack != null && dictionaryPack.isBlank()) {
            throw new IllegalArgumentException("dictionaryPack is blank: give a pack id or leave it out for no dictionary");
        }
    }

    /** A task with no tools at all: no checking, no panel, no paste; the word count still shows. */
    public static ResourcePolicy noTools() {
        return new ResourcePolicy(SpellingMode.OFF, null, null, false, true, PastePolicy.NONE);
    }

    /** The tools this policy offers; an empty set means the client shows no resource panel. */
    public Set<Tool> offeredTools() {
        Set<Tool> tools = EnumSet.noneOf(Tool.class);
        if (spelling.checksSpelling()) {
            tools.add(Tool.SPELLING);
        }
        if (spelling.checksGrammar()) {
            tools.add(Tool.GRAMMAR);
        }
        if (glossaryPack != null) {
            tools.add(Tool.GLOSSARY);
        }
        if (dictionaryPack != null) {
            tools.add(Tool.DICTIONARY);
        }
        return tools;
    }

    /** Whether the given tool may be offered in the task this policy governs. */
    public boolean allows(Tool tool) {
        return offeredTools().contains(tool);
    }
}
