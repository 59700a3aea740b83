package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.gui.rating.RatedStore;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Issue 15 §3: {@code rate sheet export} writes beside the sheet the texts of the rater's queue,
 * under blind ids only. Every file written is searched for every candidate number and name of the
 * roster (src/demo/roster.csv, invented) and for the other facts a rater must not see.
 */
class SheetScriptsTest {

    @TempDir
    Path dir;

    @Test
    void sheetExport_writesEveryQueuedTextUnderItsBlindId_andNoCandidateNumberOrName() throws Exception {
        RatedStore store = RatedStore.make(dir, List.of("R01", "R02", "R03"));
        Path sheet = dir.resolve("sheets").resolve("R01.csv");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out, true));
        cli.setErr(new PrintWriter(err, true));
        int code = cli.execute("rate", "sheet", "export", "--rater", "R01", "--out", sheet.toString(), "--store",
                store.file().toString());
        assertEquals(0, code, out + "\n" + err);
        Path folder = dir.resolve("sheets").resolve("R01-scripts");
        assertTrue(out.toString().contains(folder.toString()), out.toString());

        List<RatingDesk.QueueItem> queue;
        try (RatingStore s = store.open()) {
            queue = s.queue("R01");
            assertFalse(queue.isEmpty());
            for (RatingDesk.QueueItem q : queue) {
                String doc = Files.readString(folder.resolve(q.blindId() + ".txt"), StandardCharsets.UTF_8);
                String text = s.response("R01", q.blindId()).text();
                assertTrue(doc.startsWith("Response " + q.blindId() + "\n"), doc);
                assertTrue(doc.contains(text.replace("\r\n", "\n")), "the whole text of " + q.blindId());
            }
        }
        List<Path> files;
        try (Stream<Path> all = Files.list(folder)) {
            files = new ArrayList<>(all.toList());
        }
        assertEquals(queue.size() + 2, files.size(), "one file per script, the index and the rubric: " + files);
        files.add(sheet);
        String rubric = Files.readString(folder.resolve("rubric.txt"));
        store.exam().rubric().criteria().forEach(c -> c.bands().forEach(b -> assertTrue(rubric.contains(b.descriptor()),
                b.descriptor())));

        List<String> forbidden = new ArrayList<>();
        for (RosterCandidate c : RosterReader.read(DemoSource.DEMO.resolve("roster.csv"))) {
            forbidden.add(c.candidateNumber());
            forbidden.addAll(c.personal().values());
        }
        assertTrue(forbidden.contains("Demo Candidate One"), "the roster's names are searched for: " + forbidden);
        for (Path f : files) {
            String content = Files.readString(f, StandardCharsets.UTF_8);
            for (String word : forbidden) {
                assertFalse(content.contains(word), f.getFileName() + " contains '" + word + "'");
            }
            assertFalse(f.getFileName().toString().matches(".*H1\\d{3}.*"), f.toString());
        }
    }
}
