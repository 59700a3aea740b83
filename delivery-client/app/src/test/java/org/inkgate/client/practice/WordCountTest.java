package org.inkgate.client.practice;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class WordCountTest {

    @ParameterizedTest(name = "\"{0}\" has {1} words")
    @CsvSource(delimiter = '|', value = {
        "''|0",
        "'   '|0",
        "one|1",
        "one two  three|3",
        "'  leading and trailing  '|3",
        "don't well-known|2",
        "wait - what|2",
        "'line one\nline two'|4",
        "42 apples|2",
        "'café au lait'|3"
    })
    void of_text_countsWordsWithALetterOrDigit(String text, int expected) {
        assertEquals(expected, WordCount.of(text));
    }
}
