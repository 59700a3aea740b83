package org.inkgate.analysis.data;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads the optional candidate table: {@code candidate,level}, then every further column either as a
 * survey item with numeric answers or, when the caller declares it, as a categorical attribute
 * (first language, gender...) whose values are group names, numbers included (empty = not given).
 * The declaration is explicit because guessing from the values would turn a mistyped survey answer
 * into a group: an undeclared column with a non-number is refused with how to declare it.
 */
public final class CandidatesReader {

    private CandidatesReader() {
    }

    /** The candidates, the survey item names and the attribute names, each in header order. */
    public record Result(List<Candidate> candidates, List<String> items, List<String> attributes) {
    }

    /** Reads a table whose extra columns are all survey items. */
    public static Result read(String file, Reader reader) throws IOException, InputRejected {
        return read(file, reader, List.of());
    }

    /**
     * Reads the table; the columns named in {@code attributes} are categorical attributes.
     *
     * @param attributes column names declared categorical; each must be in the header, and none may be
     *                   {@code candidate}, {@code level} or a ratings column
     */
    public static Result read(String file, Reader reader, List<String> attributes) throws IOException, InputRejected {
        CsvTable t = CsvTable.open(file, reader);
        List<InputProblem> problems = new ArrayList<>();
        int[] pos = Columns.require(t, problems, "candidate", "level");
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        List<String> declared = attributes.stream().map(String::trim).distinct().toList();
        for (String a : declared) {
            if (a.equals("candidate") || a.equals("level") || RESERVED.contains(a)) {
                problems.add(new InputProblem(file, 1, a, "'" + a + "' cannot be an attribute: candidate and level are"
                        + " read as such, and the names " + RESERVED + " are the ratings' own columns; rename the column"));
            } else if (t.column(a) < 0) {
                problems.add(new InputProblem(file, 1, a, "the attribute '" + a + "' is not a column of the table"
                        + " (found: " + String.join(",", t.header()) + "); check the spelling of the header and"
                        + " of the declared name"));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        List<String> items = new ArrayList<>();
        List<Integer> itemPos = new ArrayList<>();
        List<String> attributeNames = new ArrayList<>();
        List<Integer> attributePos = new ArrayList<>();
        for (int i = 0; i < t.header().size(); i++) {
            String name = t.header().get(i).trim();
            if (i == pos[0] || i == pos[1]) {
                continue;
            }
            if (declared.contains(name)) {
                attributeNames.add(name);
                attributePos.add(i);
            } else {
                items.add(name);
                itemPos.add(i);
            }
        }
        Columns cols = new Columns();
        List<Candidate> out = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        CsvTable.Row row;
        while ((row = t.next()) != null) {
            if (!Columns.widthOk(t, row, problems)) {
                continue;
            }
            String id = cols.text(t, row, pos[0], "candidate", true, problems);
            String level = cols.text(t, row, pos[1], "level", false, problems);
            if (!id.isEmpty() && !ids.add(id)) {
                problems.add(new InputProblem(file, row.number(), "candidate", "candidate " + id
                        + " appears twice; give one row per candidate"));
            }
            Map<String, Double> survey = new LinkedHashMap<>();
            for (int k = 0; k < items.size(); k++) {
                String v = row.cells()[itemPos.get(k)].trim();
                if (!v.isEmpty()) {
                    if (!looksNumeric(v)) {
                        problems.add(new InputProblem(file, row.number(), items.get(k), "'" + v + "' is not a number:"
                                + " survey items take numeric answers. If '" + items.get(k) + "' is a categorical"
                                + " attribute (e.g. first language, gender), declare it as one (inkgate-admin analyse"
                                + " --attribute " + items.get(k) + "); if it is a survey item, write the answer as a"
                                + " plain number with a dot for decimals"));
                        continue;
                    }
                    survey.put(items.get(k), Columns.number(t, row, itemPos.get(k), items.get(k), problems));
                }
            }
            Map<String, String> groups = new LinkedHashMap<>();
            for (int k = 0; k < attributeNames.size(); k++) {
                String v = cols.text(t, row, attributePos.get(k), attributeNames.get(k), false, problems);
                if (!v.isEmpty()) {
                    groups.put(attributeNames.get(k), v);
                }
            }
            out.add(new Candidate(id, level, survey, groups));
            Columns.stopIfFull(problems);
        }
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        return new Result(out, items, attributeNames);
    }

    /** Ratings columns: an attribute named like one would be ambiguous in a Rasch bias pair. */
    private static final List<String> RESERVED = List.of("form", "task", "condition", "rater", "criterion", "score");

    private static boolean looksNumeric(String v) {
        try {
            return Double.isFinite(Double.parseDouble(v));
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
