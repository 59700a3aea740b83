package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A roster and a ratings file saved as Windows-1252 (a name with "é", byte 0xE9, which UTF-8 never
 * has as a lone byte: RFC 3629, section 3) are refused naming the expected encoding, the line and
 * the column, not with the JDK's "Input length = 1".
 */
class EncodingErrorsTest {

    @TempDir
    Path dir;

    @Test
    void rosterAndRatings_savedAsWindows1252_refusedNamingUtf8AndThePlace() throws Exception {
        Path roster = dir.resolve("roster.csv");
        Files.write(roster, ("candidate_number,level,display_name\nH1001,B1,Invented One\nH1002,B2,Ren\u00e9e Invented\n")
                .getBytes(java.nio.charset.Charset.forName("windows-1252")));
        ForgedPackages.Run r = ForgedPackages.here("roster", roster.toString());
        assertEquals(InkgateAdmin.PROBLEMS, r.code(), r.out());
        assertTrue(r.out().contains("is not UTF-8 text, the encoding Inkgate reads: line 3, column 13 (byte 71) holds 0xE9"),
                r.out());
        assertFalse(r.out().contains("Input length"), r.out());

        Path ratings = dir.resolve("ratings.csv");
        Files.write(ratings, ("candidate,level,form,task,condition,rater,criterion,score\n"
                + "T1,,,t1,plain,J\u00e91,overall,3\n").getBytes(java.nio.charset.Charset.forName("windows-1252")));
        ForgedPackages.Run a = ForgedPackages.here("analyse", "--ratings", ratings.toString(), "--out",
                dir.resolve("report").toString());
        assertEquals(InkgateAdmin.PROBLEMS, a.code(), a.out());
        assertTrue(a.out().contains(ratings + " is not UTF-8 text, the encoding Inkgate reads: line 2, column 16"), a.out());
        assertFalse(a.out().contains("Input length"), a.out());
        assertTrue(new String(Files.readAllBytes(ratings), StandardCharsets.ISO_8859_1).contains("\u00e9"));
    }
}
