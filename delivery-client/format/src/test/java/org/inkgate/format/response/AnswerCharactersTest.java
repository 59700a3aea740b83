package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

class AnswerCharactersTest {

    @Test
    void belowSpace_onlyTheControlsXmlAllows() {
        // XML 1.0 (Fifth Edition), section 2.2: Char ::= #x9 | #xA | #xD | [#x20-#xD7FF] | ...
        for (char c = 0; c < 0x20; c++) {
            boolean xmlChar = c == 0x9 || c == 0xA || c == 0xD;
            assertEquals(xmlChar, AnswerCharacters.allowed(c), "U+" + Integer.toHexString(c));
        }
        assertEquals(true, AnswerCharacters.allowed(' '));
        assertEquals(true, AnswerCharacters.allowed('\u00E9'));
    }

    @Test
    void clean_dropsOnlyThoseAndKeepsTheRestInOrder() {
        String plain = "Ferry \u00E0 l'\u00EEle\tnine\r\n\uD83D\uDEA2";
        assertSame(plain, AnswerCharacters.clean(plain));
        assertEquals("ab\tc\n", AnswerCharacters.clean("\u0000a\u0001b\t\u001Fc\n\u0000"));
        assertEquals("", AnswerCharacters.clean("\u0000\u0007"));
    }
}
