package org.inkgate.admin.core.export;

import com.fasterxml.jackson.core.type.TypeReference;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.json.Json;

/**
 * The tidy questionnaire table, written by {@code export} and read back by {@code analyse
 * --questionnaire}: one row per sitting and questionnaire item the sitting's form asked, answered
 * or not. Its columns are described in docs/data-dictionary.md; this class is the one writer and the
 * one reader of the format, so what the export writes is exactly what the analysis accepts.
 *
 * <p>Item kinds are the wire names of the response contract's {@link QuestionItem.Kind}
 * ({@code likert}, {@code free-text}); a Likert answer is the chosen point, 1 for the lowest label.
 */
public final class QuestionnaireCsv {

    public static final String FILE_NAME = "questionnaire_answers.csv";
    public static final List<String> COLUMNS = List.of("exam_id", "candidate_number", "level", "form_id", "package_id",
            "conditions", "questionnaire_id", "timing", "item_position", "item_id", "kind", "scale_points",
            "scale_labels_json", "item_text", "answer", "answer_label");
    /** Columns a hand-made table must have; the others may be left out. */
    public static final List<String> REQUIRED = List.of("candidate_number", "level", "conditions", "questionnaire_id",
            "item_id", "kind", "scale_points", "answer");
    /** The {@code kind} of an item the results store holds no definition of (answers kept, never guessed). */
    public static final String UNDEFINED_KIND = "";

    private static final int MAX_PROBLEMS = 100;

    private QuestionnaireCsv() {
    }

    /**
     * One row: one item asked in one sitting. {@code kind} is a {@link QuestionItem.Kind} wire name or
     * empty (no definition stored); {@code labels} are the Likert labels, lowest first;
     * {@code answer} is empty when the item was not answered.
     */
    public record Row(String examId, String candidateNumber, String level, String formId, String packageId,
            String conditions, String questionnaireId, String timing, Integer itemPosition, String itemId, String kind,
            List<String> labels, String itemText, String answer) {

        public Row {
            labels = List.copyOf(labels);
        }

        public boolean answered() {
            return !answer.isEmpty();
        }

        public boolean likert() {
            return kind.equals(wireName(QuestionItem.Kind.LIKERT));
        }

        /** The label of the chosen Likert point, or empty. */
        public String answerLabel() {
            if (!likert() || !answered()) {
                return "";
            }
            int point = Integer.parseInt(answer);
            return point >= 1 && point <= labels.size() ? labels.get(point - 1) : "";
        }
    }

    /** One bad cell or row of the table: where and how to fix it. */
    public record Problem(String file, int row, String column, String message) {
        public String describe() {
            return file + ", row " + row + (column == null ? "" : ", column " + column) + ": " + message;
        }
    }

    /** The table was refused; nothing of it was read. */
    public static final class Refused extends Exception {
        private static final long serialVersionUID = 1L;
        private final transient List<Problem> problems;

        public Refused(List<Problem> problems) {
            super(problems.size() + " problem(s) in the questionnaire table; nothing was read");
            this.problems = List.copyOf(problems);
        }

        public List<Problem> problems() {
            return problems;
        }
    }

    /** The contract's kind of a wire name, or empty for any other text (an item without a stored definition). */
    public static java.util.Optional<QuestionItem.Kind> kindOf(String wireName) {
        return java.util.Arrays.stream(QuestionItem.Kind.values()).filter(k -> wireName(k).equals(wireName)).findFirst();
    }

    /** The contract's name of a kind, e.g. {@code free-text}. */
    public static String wireName(QuestionItem.Kind kind) {
        return Json.mapper().valueToTree(kind).asText();
    }

    /** Writes the exam's questionnaire rows; returns the number of rows. */
    public static long write(ResultsStore store, String examId, Writer out) throws IOException, StoreException {
        Csv.writeRow(out, COLUMNS);
        long[] n = {0};
        try {
            store.forEachQuestionnaireAnswer(examId, a -> {
                Row r = row(a);
                try {
                    Csv.writeRow(out, List.of(r.examId(), r.candidateNumber(), r.level(), r.formId(), r.packageId(),
                            r.conditions(), r.questionnaireId(), r.timing(),
                            r.itemPosition() == null ? "" : String.valueOf(r.itemPosition()), r.itemId(), r.kind(),
                            r.likert() ? String.valueOf(r.labels().size()) : "",
                            r.likert() ? new String(Json.writeLine(r.labels()), java.nio.charset.StandardCharsets.UTF_8)
                                    .strip() : "",
                            r.itemText(), r.answer(), r.answerLabel()));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
                n[0]++;
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        out.flush();
        return n[0];
    }

    private static Row row(Rows.QuestionnaireAnswer a) {
        List<String> labels = List.of();
        if (a.labelsJson() != null) {
            try {
                labels = Json.mapper().readValue(a.labelsJson(), new TypeReference<List<String>>() { });
            } catch (IOException e) {
                throw new IllegalStateException("questionnaire item " + a.itemId() + " has labels that are not a JSON"
                        + " list in the store; the store may be damaged: " + e.getMessage(), e);
            }
        }
        return new Row(a.examId(), a.candidateNumber(), nz(a.level()), a.formId(), a.packageId(), nz(a.conditions()),
                a.questionnaireId(), nz(a.timing()), a.position(), a.itemId(), a.kind() == null ? UNDEFINED_KIND : a.kind(),
                labels, nz(a.text()), nz(a.value()));
    }

    /**
     * Reads a questionnaire table in the format {@link #write} writes (header names in any order,
     * extra columns ignored; the {@link #REQUIRED} columns must be there). Refused, with row and
     * column: a missing column, an empty candidate, questionnaire or item, an unknown kind, a Likert
     * item without a scale of at least 2 points or with labels that do not match it, a Likert answer
     * that is not one of its points, one item defined two ways, the same package (or candidate, when
     * the package column is left out) answering one item twice.
     */
    public static List<Row> read(String file, Reader in) throws IOException, Refused {
        String text;
        try {
            text = new String(readAll(in));
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        List<Csv.Row> rows;
        try {
            rows = Csv.parse(text);
        } catch (Csv.CsvSyntaxException e) {
            throw new Refused(List.of(new Problem(file, e.line(), null, e.getMessage())));
        }
        List<Problem> problems = new ArrayList<>();
        if (rows.isEmpty()) {
            throw new Refused(List.of(new Problem(file, 1, null, "the file is empty; it needs the header row "
                    + String.join(",", COLUMNS))));
        }
        Map<String, Integer> at = new HashMap<>();
        List<String> header = rows.get(0).fields();
        for (int i = 0; i < header.size(); i++) {
            at.putIfAbsent(header.get(i).trim().toLowerCase(java.util.Locale.ROOT), i);
        }
        for (String c : REQUIRED) {
            if (!at.containsKey(c)) {
                problems.add(new Problem(file, 1, c, "required column '" + c + "' is missing; the header must name "
                        + String.join(",", REQUIRED) + " (the export writes " + String.join(",", COLUMNS) + ")"));
            }
        }
        if (!problems.isEmpty()) {
            throw new Refused(problems);
        }
        List<Row> out = new ArrayList<>();
        Map<String, String> definitions = new HashMap<>();
        Set<String> seen = new HashSet<>();
        for (int r = 1; r < rows.size() && problems.size() < MAX_PROBLEMS; r++) {
            Csv.Row row = rows.get(r);
            int line = r + 1;
            if (row.fields().size() != header.size()) {
                problems.add(new Problem(file, line, null, "has " + row.fields().size() + " cells for " + header.size()
                        + " columns; quote cells that hold commas"));
                continue;
            }
            Cells c = new Cells(file, line, row.fields(), at, problems);
            String candidate = c.required("candidate_number");
            String questionnaire = c.required("questionnaire_id");
            String item = c.required("item_id");
            String kind = c.get("kind");
            String answer = c.get("answer");
            List<String> labels = List.of();
            if (kind.equals(wireName(QuestionItem.Kind.LIKERT))) {
                labels = c.labels();
                boolean isPoint = answer.matches("[1-9][0-9]{0,5}") && Integer.parseInt(answer) <= labels.size();
                if (!answer.isEmpty() && !labels.isEmpty() && !isPoint) {
                    problems.add(new Problem(file, line, "answer", "'" + shown(answer) + "' is not a point of this Likert item;"
                            + " give a whole number from 1 to " + labels.size() + ", or leave it empty (not answered)"));
                }
            } else if (!kind.equals(wireName(QuestionItem.Kind.FREE_TEXT)) && !kind.equals(UNDEFINED_KIND)) {
                problems.add(new Problem(file, line, "kind", "'" + shown(kind) + "' is not a kind; use "
                        + wireName(QuestionItem.Kind.LIKERT) + ", " + wireName(QuestionItem.Kind.FREE_TEXT)
                        + " or leave it empty (no definition)"));
            }
            String definition = kind + "\u0000" + labels;
            String itemKey = questionnaire + "\u0000" + item;
            String earlier = definitions.putIfAbsent(itemKey, definition);
            if (earlier != null && !earlier.equals(definition)) {
                problems.add(new Problem(file, line, "kind", "item " + shown(item) + " of questionnaire " + shown(questionnaire)
                        + " has another kind or scale than in an earlier row; one item has one definition"));
            }
            String packageId = c.get("package_id");
            String who = packageId.isEmpty() ? "candidate " + shown(candidate) : "package " + shown(packageId);
            if (!seen.add(who + "\u0000" + itemKey)) {
                problems.add(new Problem(file, line, "item_id", who + " has a second row for item " + shown(item)
                        + " of questionnaire " + shown(questionnaire) + "; give one row per sitting and item"));
            }
            String position = c.get("item_position");
            out.add(new Row(c.get("exam_id"), candidate, c.get("level"), c.get("form_id"), packageId, c.get("conditions"),
                    questionnaire, c.get("timing"), position.matches("[0-9]{1,6}") ? Integer.valueOf(position) : null,
                    item, kind, labels, c.get("item_text"), answer));
        }
        if (!problems.isEmpty()) {
            throw new Refused(problems);
        }
        return out;
    }

    /**
     * A cell's text as it may appear in a message on the terminal: control and other invisible
     * characters shown as '?', at most 60 characters, so a hostile file cannot steer the terminal.
     */
    public static String shown(String cell) {
        StringBuilder b = new StringBuilder();
        cell.codePoints().limit(60).forEach(c -> b.appendCodePoint(Character.isISOControl(c)
                || Character.getType(c) == Character.FORMAT || Character.getType(c) == Character.UNASSIGNED ? '?' : c));
        return cell.codePointCount(0, cell.length()) > 60 ? b + "..." : b.toString();
    }

    private static char[] readAll(Reader in) throws IOException {
        StringBuilder b = new StringBuilder();
        char[] buf = new char[1 << 14];
        int n;
        while ((n = in.read(buf)) > 0) {
            b.append(buf, 0, n);
        }
        char[] out = new char[b.length()];
        b.getChars(0, b.length(), out, 0);
        return out;
    }

    /** The cells of one row by column name; a missing optional column reads as empty. */
    private record Cells(String file, int line, List<String> fields, Map<String, Integer> at, List<Problem> problems) {

        String get(String column) {
            Integer i = at.get(column);
            return i == null ? "" : fields.get(i).trim();
        }

        String required(String column) {
            String v = get(column);
            if (v.isEmpty()) {
                problems.add(new Problem(file, line, column, "empty; every row needs a " + column));
            }
            return v;
        }

        List<String> labels() {
            String points = get("scale_points");
            if (!points.matches("[0-9]{1,3}") || Integer.parseInt(points) < 2) {
                problems.add(new Problem(file, line, "scale_points", "'" + shown(points) + "' is not a Likert scale; give the"
                        + " number of points (2 or more)"));
                return List.of();
            }
            int k = Integer.parseInt(points);
            String json = get("scale_labels_json");
            if (json.isEmpty()) {
                List<String> numbered = new ArrayList<>();
                for (int p = 1; p <= k; p++) {
                    numbered.add(String.valueOf(p)); // no labels given: the points stand for themselves
                }
                return numbered;
            }
            try {
                List<String> labels = Json.mapper().readValue(json, new TypeReference<List<String>>() { });
                if (labels.size() != k || labels.stream().anyMatch(x -> x == null || x.isBlank())) {
                    problems.add(new Problem(file, line, "scale_labels_json", "holds " + labels.size() + " labels for "
                            + k + " points; give one label per point, lowest first"));
                    return List.of();
                }
                return labels;
            } catch (IOException e) {
                problems.add(new Problem(file, line, "scale_labels_json", "is not a JSON list of texts, e.g."
                        + " [\"Disagree\",\"Agree\"]"));
                return List.of();
            }
        }
    }

    private static String nz(String s) {
        return s == null ? "" : s;
    }
}
