package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import org.inkgate.admin.core.testutil.StoreFixture;

import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.core.csv.Csv;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/** Offline rating sheets: export, fill, import; every bad row named with row and column; all or nothing. */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class RatingSheetsTest {

    @Parameter
    StoreFixture.Kind kind;


    @TempDir
    Path dir;

    private RatingStore store;
    private List<RatingDesk.QueueItem> queue;
    private String otherRatersId;

    @BeforeEach
    void assignAnInventedExam() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 8, List.of("t1", "t2"));
        store = db.rating(InventedStore.EXAM);
        for (String r : List.of("R01", "R02", "R03")) {
            store.addRater(r, "Invented " + r, null);
        }
        store.assign(2, 77L, false);
        queue = store.queue("R01");
        List<RatingDesk.QueueItem> mine = queue;
        otherRatersId = store.queue("R02").stream().map(RatingDesk.QueueItem::blindId)
                .filter(id -> mine.stream().noneMatch(q -> q.blindId().equals(id))).findFirst().orElseThrow();
    }

    @org.junit.jupiter.api.AfterEach
    void close() throws Exception {
        store.close();
    }

    private String exported() throws Exception {
        StringWriter w = new StringWriter();
        assertEquals(queue.size(), RatingSheets.export(store, "R01", w));
        return w.toString();
    }

    /** The exported sheet with every row scored (content 5, language 6). */
    private String filled() throws Exception {
        StringBuilder out = new StringBuilder();
        for (Csv.Row row : Csv.parse(exported())) {
            List<String> f = row.fields();
            if (row.line() == 1) {
                out.append(String.join(",", f)).append("\r\n");
            } else {
                out.append(f.get(0)).append(',').append(f.get(1)).append(",5,6,\"fine, clear\"\r\n");
            }
        }
        return out.toString();
    }

    @Test
    void export_queueInOrderWithCriterionColumns() throws Exception {
        List<Csv.Row> rows = Csv.parse(exported());
        assertEquals(List.of("blind_id", "task", "content", "language", "comment"), rows.get(0).fields());
        for (int i = 0; i < queue.size(); i++) {
            assertEquals(queue.get(i).blindId(), rows.get(i + 1).fields().get(0));
            assertEquals("", rows.get(i + 1).fields().get(2), "nothing scored yet");
        }
    }

    @Test
    void importSheet_filled_storesAll_andReimportAddsNothing() throws Exception {
        String sheet = filled();
        RatingSheets.Imported first = RatingSheets.importSheet(store, "R01", "R01.csv", sheet);
        assertEquals(queue.size(), first.storedNewOrChanged());
        assertEquals(queue.size(), store.progress("R01").rated());
        RatingSheets.Imported again = RatingSheets.importSheet(store, "R01", "R01.csv", sheet);
        assertEquals(0, again.storedNewOrChanged(), "idempotent");
        assertEquals(1, store.history(queue.get(0).blindId()).size());
        assertEquals("fine, clear", store.submitted("R01", queue.get(0).blindId()).orElseThrow().comment());
        assertEquals("sheet R01.csv", store.history(queue.get(0).blindId()).get(0).via());
        // the re-exported sheet carries the stored scores
        assertTrue(exported().contains(queue.get(0).blindId() + "," + queue.get(0).taskId() + ",5,6,\"fine, clear\""));
    }

    @Test
    void importSheet_blankRows_areNotYetRated() throws Exception {
        RatingSheets.Imported none = RatingSheets.importSheet(store, "R01", "R01.csv", exported());
        assertEquals(queue.size(), none.notYetRated());
        assertEquals(0, none.storedNewOrChanged());
    }

    @Test
    void importSheet_badRows_eachNamedWithRowAndColumn_andNothingStored() throws Exception {
        String[] lines = filled().split("\r\n");
        String a = queue.get(0).blindId();
        String b = queue.get(1).blindId();
        String c = queue.get(2).blindId();
        String d = queue.get(3).blindId();
        String e = queue.get(4).blindId();
        lines[1] = a + "," + queue.get(0).taskId() + ",10,6,";          // row 2: out of range
        lines[2] = b + "," + queue.get(1).taskId() + ",5,,";            // row 3: missing criterion
        lines[3] = c + "," + queue.get(2).taskId() + ",five,6,";        // row 4: bad number
        lines[4] = "ZZZZ-ZZZZ," + queue.get(3).taskId() + ",5,6,";      // row 5: unknown id
        lines[5] = otherRatersId + "," + queue.get(4).taskId() + ",5,6,"; // row 6: another rater's id
        String text = String.join("\r\n", lines) + "\r\n";
        RatingSheets.SheetRejected r = assertThrows(RatingSheets.SheetRejected.class,
                () -> RatingSheets.importSheet(store, "R01", "R01.csv", text));
        List<String> p = r.problems().stream().map(RatingSheets.Problem::toString).toList();
        assertTrue(p.contains("R01.csv row 2, column content: score 10 is out of range; give one from 1 to 9"), p.toString());
        assertTrue(p.contains("R01.csv row 3, column language: missing score; give a whole number from 1 to 9"),
                p.toString());
        assertTrue(p.contains("R01.csv row 4, column content: 'five' is not a whole number; give one from 1 to 9"),
                p.toString());
        assertTrue(p.contains("R01.csv row 5, column blind_id: unknown id 'ZZZZ-ZZZZ'; use the ids exactly as exported"),
                p.toString());
        assertTrue(p.contains("R01.csv row 6, column blind_id: " + otherRatersId
                + " is not in rater R01's queue; is this another rater's sheet?"), p.toString());
        assertEquals(5, p.size(), p.toString());
        assertEquals(0, store.progress("R01").rated(), "nothing stored");
        assertTrue(d != null && e != null);
    }

    @Test
    void importSheet_badHeaderOrShiftedRow_isNamed() throws Exception {
        String noLanguage = "blind_id,task,content,comment\r\n";
        RatingSheets.SheetRejected h = assertThrows(RatingSheets.SheetRejected.class,
                () -> RatingSheets.importSheet(store, "R01", "s.csv", noLanguage));
        assertTrue(h.getMessage().contains("s.csv row 1, column language: the column is missing"), h.getMessage());
        String shifted = "blind_id,task,content,language,comment\r\n" + queue.get(0).blindId() + ",5,6,x\r\n";
        RatingSheets.SheetRejected s = assertThrows(RatingSheets.SheetRejected.class,
                () -> RatingSheets.importSheet(store, "R01", "s.csv", shifted));
        assertTrue(s.getMessage().contains("s.csv row 2, column -: has 4 fields but the header has 5"), s.getMessage());
    }
}
