package org.inkgate.admin.core.forms;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.format.io.AtomicFiles;

/**
 * The assignment table as a CSV file (candidate_number, level, form_id, seed), so the seed travels
 * with the assignment and a bundle can be rebuilt from exactly the same table.
 */
public final class AssignmentTable {

    static final List<String> COLUMNS = List.of("candidate_number", "level", "form_id", "seed");

    private AssignmentTable() {
    }

    public static String csv(Assignment a) {
        StringWriter out = new StringWriter();
        try {
            Csv.writeRow(out, COLUMNS);
            for (Assignment.Row r : a.rows()) {
                Csv.writeRow(out, List.of(r.candidateNumber(), r.level(), r.formId(), Long.toString(a.seed())));
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        return out.toString();
    }

    public static void write(Assignment a, Path file) throws IOException {
        byte[] bytes = csv(a).getBytes(StandardCharsets.UTF_8);
        AtomicFiles.write(file, out -> out.write(bytes));
    }

    public static Assignment read(Path file) throws InvalidSourceException, IOException {
        String name = file.getFileName().toString();
        List<Csv.Row> rows;
        try {
            rows = Csv.parse(org.inkgate.format.io.Utf8Text.read(file));
        } catch (Csv.CsvSyntaxException e) {
            throw new InvalidSourceException("the assignment " + file + " cannot be used",
                    List.of(new Problem(name, e.line(), 0, "", e.getMessage())));
        }
        List<Problem> problems = new ArrayList<>();
        if (rows.isEmpty() || !rows.get(0).fields().equals(COLUMNS)) {
            throw new InvalidSourceException("the assignment " + file + " cannot be used", List.of(new Problem(name, 1, 0, "",
                    "the first line must be " + String.join(",", COLUMNS) + "; write the table with \"inkgate-admin forms\"")));
        }
        List<Assignment.Row> out = new ArrayList<>();
        Long seed = null;
        for (Csv.Row r : rows.subList(1, rows.size())) {
            if (r.fields().size() != COLUMNS.size()) {
                problems.add(new Problem(name, r.line(), 0, "", "has " + r.fields().size() + " fields, not 4"));
                continue;
            }
            try {
                long s = Long.parseLong(r.fields().get(3));
                if (seed != null && seed != s) {
                    problems.add(new Problem(name, r.line(), 4, "seed", "differs from the seed on the lines above; the"
                            + " table must come from one assignment run"));
                }
                seed = s;
            } catch (NumberFormatException e) {
                problems.add(new Problem(name, r.line(), 4, "seed", "is not a whole number"));
            }
            out.add(new Assignment.Row(r.fields().get(0), r.fields().get(1), r.fields().get(2)));
        }
        if (!problems.isEmpty()) {
            throw new InvalidSourceException("the assignment " + file + " cannot be used", problems);
        }
        return new Assignment(seed == null ? 0 : seed, out);
    }
}
