package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.gui.rating.RatedStore;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Roster fields as attributes, read from a real results store (the demo exam collected by
 * {@link RatedStore}, whose roster also gets an invented personal field "gender"): never read unless
 * named with {@code --roster-attribute}, the test owner's explicit permission.
 */
class AnalyseRosterAttributesTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = new CommandLine(new AnalyseCommand());
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void analyse_store_rosterFieldsOnlyWhenNamed(@TempDir Path dir) throws Exception {
        RatedStore rated = RatedStore.make(dir.resolve("s"), List.of("R1", "R2"));
        List<RosterCandidate> roster = new ArrayList<>();
        int i = 0;
        for (RosterCandidate r : RosterReader.read(DemoSource.DEMO.resolve("roster.csv"))) {
            roster.add(new RosterCandidate(r.candidateNumber(), r.level(), r.firstLanguage(), r.extraTimePercent(),
                    r.largePrint(), r.highContrast(), Map.of("gender", i++ % 2 == 0 ? "f" : "m")));
        }
        try (ResultsStore s = StoreFixture.of(rated.file()).results()) {
            s.registerRoster(rated.exam().examId(), roster);
        }
        // invented scores, structure only: each demo candidate under both conditions
        StringBuilder r = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        i = 0;
        for (RosterCandidate c : roster) {
            r.append(c.candidateNumber()).append(",,,ferry-complaint,with-resources,R1,overall,").append(2 + i % 3).append('\n');
            r.append(c.candidateNumber()).append(",,,market-square,without-resources,R1,overall,").append(1 + i++ % 4)
                    .append('\n');
        }
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), r);

        Path plain = dir.resolve("plain");
        assertEquals(0, run("--ratings", ratings.toString(), "--store", rated.file().toString(), "--out", plain.toString()),
                err.toString());
        JsonNode s = new ObjectMapper().readTree(plain.resolve("summary.json").toFile());
        for (Iterator<String> k = s.fieldNames(); k.hasNext();) {
            assertFalse(k.next().startsWith("attributes."), "no roster field is read unless named");
        }
        assertFalse(Files.readString(plain.resolve("report.html")).contains("Polish"));

        Path allowed = dir.resolve("allowed");
        assertEquals(0, run("--ratings", ratings.toString(), "--store", rated.file().toString(), "--roster-attribute",
                "gender,first_language", "--out", allowed.toString()), err.toString());
        s = new ObjectMapper().readTree(allowed.resolve("summary.json").toFile());
        assertEquals("[\"f\",\"m\"]", s.get("attributes.gender.groups").toString());
        assertEquals(6, s.get("attributes.gender.with_resources.overall.f.n").asInt());
        assertEquals(12, s.get("attributes.first_language.groups").size(), "12 languages in src/demo/roster.csv");
        assertEquals(12, s.get("attributes.first_language.small_groups").size(), "every group of 1 is flagged");

        assertEquals(AnalyseCommand.INPUT_REFUSED, run("--ratings", ratings.toString(), "--store", rated.file().toString(),
                "--roster-attribute", "gendr", "--out", dir.resolve("typo").toString()));
        assertTrue(err.toString().contains("--roster-attribute gendr"), err.toString());
        assertEquals(2, run("--ratings", ratings.toString(), "--roster-attribute", "gender", "--out",
                dir.resolve("nostore").toString()), "--roster-attribute needs --store");
    }
}
