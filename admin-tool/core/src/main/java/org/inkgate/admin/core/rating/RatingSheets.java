package org.inkgate.admin.core.rating;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.source.ExamSource;

/**
 * Offline rating sheets for raters without the desk: one CSV (RFC 4180) per rater with columns
 * {@code blind_id,task}, one column per criterion id, and {@code comment}; one row per item of the
 * rater's queue in working order, with scores already submitted filled in. The filled sheet comes
 * back through {@link #importSheet}: every row is checked, each problem is named with its row (the
 * line number a spreadsheet shows) and column, and nothing is stored if any row is bad. A row with
 * no score and no comment is a response not rated yet and is skipped. Importing the same sheet
 * again stores nothing new.
 */
public final class RatingSheets {

    /** One problem of a sheet, where it is and what to do. */
    public record Problem(String file, long row, String column, String message) {
        @Override
        public String toString() {
            return file + " row " + row + ", column " + column + ": " + message;
        }
    }

    /** A sheet refused as a whole, with every problem found. */
    public static final class SheetRejected extends RatingException {
        private final transient List<Problem> problems;

        SheetRejected(List<Problem> problems) {
            super(problems.size() + " problem(s) in the rating sheet; nothing was stored:\n  "
                    + String.join("\n  ", problems.stream().map(Problem::toString).toList()));
            this.problems = List.copyOf(problems);
        }

        public List<Problem> problems() {
            return problems;
        }
    }

    /** What an import did. */
    public record Imported(int rowsRead, int notYetRated, int storedNewOrChanged) {
    }

    private RatingSheets() {
    }

    /** The header: blind_id, task, the criteria in rubric order, comment. */
    public static List<String> header(ExamSource.Rubric rubric) {
        List<String> h = new ArrayList<>(List.of("blind_id", "task"));
        rubric.criteria().forEach(c -> h.add(c.id()));
        h.add("comment");
        return h;
    }

    /** Writes the rater's queue as a sheet; returns the number of rows. */
    public static int export(RatingStore store, String raterId, Writer out) throws RatingException, IOException {
        ExamSource.Rubric rubric = store.rubric();
        Csv.writeRow(out, header(rubric));
        int n = 0;
        for (RatingDesk.QueueItem item : store.queue(raterId)) {
            Optional<RatingDesk.RatingSheet> done = store.submitted(raterId, item.blindId());
            List<String> row = new ArrayList<>(List.of(item.blindId(), item.taskId()));
            for (ExamSource.Criterion c : rubric.criteria()) {
                row.add(done.map(s -> s.scores().get(c.id())).map(String::valueOf).orElse(""));
            }
            row.add(done.map(RatingDesk.RatingSheet::comment).orElse(""));
            Csv.writeRow(out, row);
            n++;
        }
        out.flush();
        return n;
    }

    /** Checks the filled sheet of one rater and stores its ratings in one transaction, or stores nothing. */
    public static Imported importSheet(RatingStore store, String raterId, String file, String text)
            throws RatingException {
        List<Problem> problems = new ArrayList<>();
        List<Csv.Row> rows;
        try {
            rows = Csv.parse(text);
        } catch (Csv.CsvSyntaxException e) {
            throw new SheetRejected(List.of(new Problem(file, e.line(), "-", e.getMessage())));
        }
        if (rows.isEmpty()) {
            throw new SheetRejected(List.of(new Problem(file, 1, "-", "the sheet is empty; export it again with"
                    + " rate sheet export")));
        }
        ExamSource.Rubric rubric = store.rubric();
        List<String> expected = header(rubric);
        List<String> header = rows.get(0).fields().stream().map(String::strip).toList();
        Map<String, Integer> col = new HashMap<>();
        for (int i = 0; i < header.size(); i++) {
            if (!expected.contains(header.get(i))) {
                problems.add(new Problem(file, rows.get(0).line(), header.get(i), "not a column of this sheet; the"
                        + " columns are " + expected));
            } else if (col.putIfAbsent(header.get(i), i) != null) {
                problems.add(new Problem(file, rows.get(0).line(), header.get(i), "the column appears twice; keep one"));
            }
        }
        for (String e : expected) {
            if (!col.containsKey(e) && !e.equals("comment") && !e.equals("task")) {
                problems.add(new Problem(file, rows.get(0).line(), e, "the column is missing; export the sheet again"
                        + " and fill that one"));
            }
        }
        if (!problems.isEmpty()) {
            throw new SheetRejected(problems);
        }
        Map<String, String> taskOf = new HashMap<>();
        store.queue(raterId).forEach(q -> taskOf.put(q.blindId(), q.taskId()));
        Map<String, RatingDesk.RatingSheet> sheets = new LinkedHashMap<>();
        Set<String> seen = new HashSet<>();
        int blank = 0;
        for (Csv.Row row : rows.subList(1, rows.size())) {
            long line = row.line();
            if (problems.size() >= org.inkgate.admin.core.csv.ProblemLimit.MAX) {
                problems.add(new Problem(file, line, "-", org.inkgate.admin.core.csv.ProblemLimit.STOPPED));
                break;
            }
            List<String> f = row.fields();
            if (f.size() != header.size()) {
                problems.add(new Problem(file, line, "-", "has " + f.size() + " fields but the header has "
                        + header.size() + "; a comment with a comma must be in double quotes"));
                continue;
            }
            String id = f.get(col.get("blind_id")).strip();
            if (id.isEmpty()) {
                problems.add(new Problem(file, line, "blind_id", "is empty; every row needs the id it was exported with"));
                continue;
            }
            Optional<String> settled = BlindIds.looksLikeId(id) && store.raterOf(id).filter(raterId::equals).isPresent()
                    ? store.settledAt(id) : Optional.empty();
            boolean blankRow = rubric.criteria().stream().allMatch(c -> f.get(col.get(c.id())).isBlank())
                    && (!col.containsKey("comment") || f.get(col.get("comment")).isBlank());
            if (settled.isPresent() && !blankRow && !store.submitted(raterId, id).isPresent()) {
                problems.add(new Problem(file, line, "blind_id", id + " was settled by the test owner's resolution entry ("
                        + settled.get() + ") and has left the queue; its rating is not taken. Clear this row's scores"
                        + " and comment, or delete the row"));
                continue;
            }
            if (settled.isPresent() && blankRow) {
                blank++;
                continue;
            }
            if (!taskOf.containsKey(id)) {
                Optional<String> owner = BlindIds.looksLikeId(id) ? store.raterOf(id) : Optional.empty();
                problems.add(new Problem(file, line, "blind_id", owner.isPresent()
                        ? id + " is not in rater " + raterId + "'s queue; is this another rater's sheet?"
                        : "unknown id '" + id + "'; use the ids exactly as exported"));
                continue;
            }
            if (!seen.add(id)) {
                problems.add(new Problem(file, line, "blind_id", id + " appears in more than one row; keep one row per id"));
                continue;
            }
            if (col.containsKey("task") && !f.get(col.get("task")).strip().equals(taskOf.get(id))) {
                problems.add(new Problem(file, line, "task", "'" + f.get(col.get("task")).strip() + "' but " + id
                        + " is a response to task " + taskOf.get(id) + "; were rows or columns moved?"));
            }
            String comment = col.containsKey("comment") ? f.get(col.get("comment")).strip() : "";
            boolean anyScore = rubric.criteria().stream().anyMatch(c -> !f.get(col.get(c.id())).isBlank());
            if (!anyScore && comment.isEmpty()) {
                blank++;
                continue;
            }
            Map<String, Integer> scores = new LinkedHashMap<>();
            for (ExamSource.Criterion c : rubric.criteria()) {
                String cell = f.get(col.get(c.id())).strip();
                if (cell.isEmpty()) {
                    problems.add(new Problem(file, line, c.id(), "missing score; give a whole number from "
                            + c.minScore() + " to " + c.maxScore()));
                    continue;
                }
                int score;
                try {
                    score = Integer.parseInt(cell);
                } catch (NumberFormatException e) {
                    problems.add(new Problem(file, line, c.id(), "'" + cell + "' is not a whole number; give one from "
                            + c.minScore() + " to " + c.maxScore()));
                    continue;
                }
                if (score < c.minScore() || score > c.maxScore()) {
                    problems.add(new Problem(file, line, c.id(), "score " + score + " is out of range; give one from "
                            + c.minScore() + " to " + c.maxScore()));
                    continue;
                }
                scores.put(c.id(), score);
            }
            sheets.put(id, new RatingDesk.RatingSheet(scores, comment));
        }
        if (!problems.isEmpty()) {
            throw new SheetRejected(problems);
        }
        int stored = sheets.isEmpty() ? 0 : store.submitAll(raterId, sheets, "sheet " + file);
        return new Imported(rows.size() - 1, blank, stored);
    }
}
