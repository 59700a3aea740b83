package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.inkgate.packs.spelling.CheckIssue;
import org.junit.jupiter.api.Test;

/**
 * How a flag moves through an edit. Expected offsets are worked out by hand on the texts in the
 * comments (UTF-16 offsets, as the log counts them).
 */
class FlagsTest {

    // "the ferie left": "ferie" is [4, 9)
    private static final CheckIssue FERIE = new CheckIssue(CheckIssue.Kind.SPELLING, "R", "TYPOS", 4, 9, "m", List.of("ferry"));

    private static Optional<CheckIssue> through(int pos, String removed, String inserted) {
        return Flags.through(FERIE, new TextEdit(pos, removed, inserted));
    }

    @Test
    void through_editBefore_movesTheFlag() {
        // "Oh, the ferie left": 4 characters typed at 0
        assertEquals(8, through(0, "", "Oh, ").orElseThrow().start());
        assertEquals(13, through(0, "", "Oh, ").orElseThrow().end());
        // "e ferie left": "th" deleted at 0
        assertEquals(2, through(0, "th", "").orElseThrow().start());
    }

    @Test
    void through_editAfter_leavesTheFlag() {
        assertEquals(Optional.of(FERIE), through(10, "left", "went"));
    }

    @Test
    void through_editInsideOrOverlapping_dropsTheFlag() {
        assertTrue(through(6, "r", "rr").isEmpty());
        assertTrue(through(2, "e fe", "").isEmpty());
    }

    @Test
    void through_letterTypedAgainstTheWord_dropsTheFlag() {
        assertTrue(through(9, "", "s").isEmpty(), "\"feries\" is another word");
        assertTrue(through(4, "", "x").isEmpty(), "\"xferie\" is another word");
    }

    @Test
    void through_spaceTypedAgainstTheWord_keepsItInPlace() {
        assertEquals(Optional.of(FERIE), through(9, "", " "), "typing on after the word must not make the flag flicker");
        CheckIssue moved = through(4, "", " ").orElseThrow();
        assertEquals(5, moved.start(), "a space typed before the word pushes it along");
    }

    @Test
    void through_deletionBesideTheWord_dropsIt() {
        // "the ferieleft": words may join
        assertTrue(through(9, " ", "").isEmpty());
    }

    @Test
    void apply_returnsTheDroppedFlags() {
        Flags flags = new Flags();
        CheckIssue later = new CheckIssue(CheckIssue.Kind.GRAMMAR, "G", "GRAMMAR", 10, 14, "m", List.of());
        flags.replaceAll(List.of(FERIE, later));
        assertEquals(List.of(FERIE), flags.apply(new TextEdit(5, "e", "")));
        assertEquals(List.of(new CheckIssue(CheckIssue.Kind.GRAMMAR, "G", "GRAMMAR", 9, 13, "m", List.of())), flags.all());
        assertEquals(Optional.of(flags.all().get(0)), flags.at(13), "a flag covers its end, where the caret stands after the word");
        assertEquals(Optional.empty(), flags.at(3));
    }
}
