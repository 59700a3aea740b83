package org.inkgate.admin.core.qti;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The identifier rule against the NCName production of XML Namespaces 1.0 (section 3, {@code NCName}),
 * which the QTI 3.0 schemas use for identifiers; the schema itself is checked in QtiResultsExportTest.
 */
class QtiIdentifierTest {

    @Test
    void encode_keepsLetterFirstIds_prefixesTheRest_andDecodeReverses() {
        assertEquals("H1004", QtiIdentifier.encode("H1004"));
        assertEquals("task-1.b_c", QtiIdentifier.encode("task-1.b_c"));
        assertEquals("_0042", QtiIdentifier.encode("0042"));
        assertEquals("_12_5F_3", QtiIdentifier.encode("12_3"));
        assertEquals("_exam_2F_A", QtiIdentifier.encode("exam/A"));
        assertEquals("_.._2F_escape", QtiIdentifier.encode("../escape"));
        assertEquals("_caf_E9_", QtiIdentifier.encode("café"));
        assertEquals("__5F_x", QtiIdentifier.encode("_x"));
        for (String id : List.of("H1004", "0042", "12_3", "exam/A", "../escape", "café", "_x", "a b", "1F600-\uD83D\uDE00",
                "6f1c2d3e-0000-4000-8000-000000000001", "_", "-", ".")) {
            String encoded = QtiIdentifier.encode(id);
            assertTrue(encoded.matches("[A-Za-z_][A-Za-z0-9._-]*"), encoded + " is an NCName");
            assertEquals(Optional.of(id), QtiIdentifier.decode(encoded), id);
        }
    }

    @Test
    void decode_refusesWhatTheRuleNeverMakes() {
        assertEquals(Optional.empty(), QtiIdentifier.decode("_abc"), "encode leaves abc plain");
        assertEquals(Optional.empty(), QtiIdentifier.decode("_12_5F"), "unterminated escape");
        assertEquals(Optional.empty(), QtiIdentifier.decode("_12_zz_"), "not hexadecimal");
        assertEquals(Optional.empty(), QtiIdentifier.decode("1abc"), "not an NCName");
        assertEquals(Optional.empty(), QtiIdentifier.decode(""));
    }
}
