package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.gui.rating.RatedStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** Issue 15 §3: a script referred to the test owner is listed with its reason and note, and decided. */
class ReferralsCommandTest {

    @TempDir
    Path dir;

    private record Result(int code, String out, String err) {
    }

    private static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out, true));
        cli.setErr(new PrintWriter(err, true));
        return new Result(cli.execute(args), out.toString(), err.toString());
    }

    @Test
    void refer_listedWithReasonAndCandidateForTheTestOwner_openUntilDecided() throws Exception {
        RatedStore store = RatedStore.make(dir, List.of("R01", "R02", "R03"));
        String db = store.file().toString();
        String blind;
        String candidate;
        try (RatingStore s = store.open()) {
            RatingDesk.QueueItem first = s.queue("R01").get(0);
            blind = first.blindId();
        }
        try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + db); var ps = c.prepareStatement(
                "SELECT s.candidate_number FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                        + " WHERE a.blind_id = ?")) {
            ps.setString(1, blind);
            try (var rs = ps.executeQuery()) {
                candidate = rs.getString(1);
            }
        }

        Result bad = run("rate", "refer", "--store", db, "--rater", "R01", "--id", blind, "--reason", "dislike", "--note", "x");
        assertEquals(InkgateAdmin.PROBLEMS, bad.code());
        assertTrue(bad.err().contains("[identity-revealed, unallowed-help, off-task, other]"), bad.err());
        Result notHers = run("rate", "refer", "--store", db, "--rater", "R02", "--id", blind, "--reason", "off-task",
                "--note", "x");
        assertEquals(InkgateAdmin.PROBLEMS, notHers.code(), "only a script of the rater's own queue");

        Result refer = run("rate", "refer", "--store", db, "--rater", "R01", "--id", blind, "--reason",
                "identity-revealed", "--note", "signs the letter with a full name\u001b[2J");
        assertEquals(0, refer.code(), refer.err());
        Result list = run("rate", "referrals", "list", "--store", db);
        assertEquals(InkgateAdmin.ATTENTION, list.code(), list.out());
        assertTrue(list.out().contains("referral 1  " + blind + "  task "), list.out());
        assertTrue(list.out().contains("candidate " + candidate + "  by rater R01"), list.out());
        assertTrue(list.out().contains("identity-revealed (the text reveals who wrote it): signs the letter with a full"
                + " name\\u001b[2J"), "the control character is shown escaped: " + list.out());
        assertFalse(list.out().contains("\u001b"), list.out());
        assertTrue(list.out().contains("OPEN"), list.out());

        Result decide = run("rate", "referrals", "decide", "--store", db, "--referral", "1", "--by", "Invented test owner",
                "--decision", "name removed from the copy raters see; rate as usual");
        assertEquals(0, decide.code(), decide.err());
        Result after = run("rate", "referrals", "list", "--store", db, "--open");
        assertEquals(0, after.code());
        assertTrue(after.out().startsWith("0 referral(s)"), after.out());
        Result all = run("rate", "referrals", "list", "--store", db);
        assertTrue(all.out().contains("decided by Invented test owner"), all.out());
        Result none = run("rate", "referrals", "decide", "--store", db, "--referral", "9", "--by", "x", "--decision", "y");
        assertEquals(InkgateAdmin.PROBLEMS, none.code());
        assertTrue(none.err().contains("no referral 9"), none.err());
    }
}
