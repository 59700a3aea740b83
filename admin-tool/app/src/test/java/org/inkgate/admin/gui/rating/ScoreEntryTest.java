package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.junit.jupiter.api.Test;

/**
 * What a score field accepts as the rater types. The ranges are those of the invented demo rubric
 * (src/demo/exam-source/rubric.yaml: 1-9) and two invented ones that test the edges: a range
 * starting at 0 and a two-digit range (10-20), where "1" begins a score without being one.
 */
class ScoreEntryTest {

    private static final ExamSource.Criterion ONE_TO_NINE = new ExamSource.Criterion("c", "Coherence", 1, 9, List.of());
    private static final ExamSource.Criterion ZERO_TO_FIVE = new ExamSource.Criterion("z", "Range", 0, 5, List.of());
    private static final ExamSource.Criterion TEN_TO_TWENTY = new ExamSource.Criterion("t", "Total", 10, 20, List.of());

    @Test
    void of_digitsWithinTheRange_valid() {
        assertEquals(new ScoreEntry.Valid(1), ScoreEntry.of(ONE_TO_NINE, "1"));
        assertEquals(new ScoreEntry.Valid(9), ScoreEntry.of(ONE_TO_NINE, "9"));
        assertEquals(new ScoreEntry.Valid(0), ScoreEntry.of(ZERO_TO_FIVE, "0"));
        assertEquals(new ScoreEntry.Valid(20), ScoreEntry.of(TEN_TO_TWENTY, "20"));
    }

    @Test
    void of_emptyField_empty() {
        assertEquals(new ScoreEntry.Empty(), ScoreEntry.of(ONE_TO_NINE, ""));
    }

    @Test
    void of_beginningOfALongerScore_partial() {
        assertEquals(new ScoreEntry.Partial("1"), ScoreEntry.of(TEN_TO_TWENTY, "1"));
        assertEquals(new ScoreEntry.Partial("2"), ScoreEntry.of(TEN_TO_TWENTY, "2"));
    }

    @Test
    void of_outsideTheRange_refusedNamingTheRange() {
        assertEquals(new ScoreEntry.Refused("12 is outside Coherence: scores run from 1 to 9."), ScoreEntry.of(ONE_TO_NINE, "12"));
        assertEquals(new ScoreEntry.Refused("0 is outside Coherence: scores run from 1 to 9."), ScoreEntry.of(ONE_TO_NINE, "0"));
        assertEquals(new ScoreEntry.Refused("6 is outside Range: scores run from 0 to 5."), ScoreEntry.of(ZERO_TO_FIVE, "6"));
        assertEquals(new ScoreEntry.Refused("3 is outside Total: scores run from 10 to 20."), ScoreEntry.of(TEN_TO_TWENTY, "3"));
        assertEquals(new ScoreEntry.Refused("21 is outside Total: scores run from 10 to 20."), ScoreEntry.of(TEN_TO_TWENTY, "21"));
        assertInstanceOf(ScoreEntry.Refused.class, ScoreEntry.of(ZERO_TO_FIVE, "00"), "a leading zero never becomes a score");
        assertInstanceOf(ScoreEntry.Refused.class, ScoreEntry.of(ONE_TO_NINE, "99999999999999"), "too long, no overflow");
    }

    @Test
    void of_notDigits_refused() {
        for (String text : List.of("x", "-1", "4.5", " 4", "\u0665")) { // the last is ARABIC-INDIC DIGIT FIVE
            assertInstanceOf(ScoreEntry.Refused.class, ScoreEntry.of(ONE_TO_NINE, text), text);
        }
    }

    @Test
    void step_staysWithinTheRange_andStartsAtTheLowestScore() {
        assertEquals(1, ScoreEntry.step(ONE_TO_NINE, new ScoreEntry.Empty(), +1));
        assertEquals(1, ScoreEntry.step(ONE_TO_NINE, new ScoreEntry.Empty(), -1));
        assertEquals(6, ScoreEntry.step(ONE_TO_NINE, new ScoreEntry.Valid(5), +1));
        assertEquals(9, ScoreEntry.step(ONE_TO_NINE, new ScoreEntry.Valid(9), +1));
        assertEquals(1, ScoreEntry.step(ONE_TO_NINE, new ScoreEntry.Valid(1), -1));
        assertEquals(10, ScoreEntry.step(TEN_TO_TWENTY, new ScoreEntry.Partial("1"), +1));
    }
}
