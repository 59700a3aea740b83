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

    /**
     * Writes a new table. An existing table with other contents is kept unless {@code replace}: a
     * bundle may already have been built from it, and a silently redrawn table would make later
     * steps record the wrong forms.
     */
    public static void write(Assignment a, Path file, boolean replace) throws IOException, ExistsException {
        byte[] bytes = csv(a).getBytes(StandardCharsets.UTF_8);
        if (!replace && java.nio.file.Files.exists(file)
                && !java.util.Arrays.equals(bytes, java.nio.file.Files.readAllBytes(file))) {
            throw new ExistsException(file, describe(file));
        }
        AtomicFiles.write(file, out -> out.write(bytes));
    }

    private static String describe(Path file) {
        try {
            Assignment old = read(file);
            return "seed " + old.seed() + ", " + old.rows().size() + " candidates";
        } catch (InvalidSourceException | IOException | RuntimeException e) {
            return "not a readable assignment table";
        }
    }

    /** An assignment table is already at the file named, with other contents; nothing was written. */
    public static final class ExistsException extends Exception {
        private static final long serialVersionUID = 1L;

        ExistsException(Path file, String what) {
            super("The assignment table " + file + " already exists (" + what + ") and was kept: a bundle built from it"
                    + " would no longer match. Name another file, or choose to replace it explicitly (the forms command's"
                    + " --replace, or \"Replace an existing table\" in the admin window).");
        }
    }

    /**
     * Checks that {@code table} is the assignment the bundle was built from: the bundle's roster
     * carries each candidate's form, so every candidate must sit the same form in both.
     */
    public static List<Problem> mismatches(Assignment table, Path tableFile,
            List<org.inkgate.format.bundle.RosterEntry> bundleRoster) {
        String name = tableFile.getFileName().toString();
        java.util.Map<String, String> inTable = table.formByCandidate();
        List<Problem> problems = new ArrayList<>();
        for (org.inkgate.format.bundle.RosterEntry e : bundleRoster) {
            String form = inTable.get(e.candidateNumber());
            if (form == null) {
                problems.add(new Problem(name, 0, 0, e.candidateNumber(), "candidate " + e.candidateNumber()
                        + " is in the bundle (form " + e.formId() + ") but not in this table"));
            } else if (!form.equals(e.formId())) {
                problems.add(new Problem(name, 0, 0, e.candidateNumber(), "candidate " + e.candidateNumber()
                        + " sits form " + e.formId() + " in the bundle but " + form + " in this table"));
            }
        }
        java.util.Set<String> inBundle = new java.util.HashSet<>();
        bundleRoster.forEach(e -> inBundle.add(e.candidateNumber()));
        inTable.keySet().stream().filter(n -> !inBundle.contains(n)).forEach(n -> problems.add(new Problem(name, 0, 0, n,
                "candidate " + n + " is in this table but not on the bundle's roster")));
        return problems;
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
