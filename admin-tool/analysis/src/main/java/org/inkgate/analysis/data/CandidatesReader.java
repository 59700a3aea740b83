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
 * Reads the optional candidate table: {@code candidate,level} and any further columns as survey
 * items with numeric answers (empty = not answered).
 */
public final class CandidatesReader {

    private CandidatesReader() {
    }

    /** The candidates and the survey item names in header order. */
    public record Result(List<Candidate> candidates, List<String> items) {
    }

    public static Result read(String file, Reader reader) throws IOException, InputRejected {
        CsvTable t = CsvTable.open(file, reader);
        List<InputProblem> problems = new ArrayList<>();
        int[] pos = Columns.require(t, problems, "candidate", "level");
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        List<String> items = new ArrayList<>();
        List<Integer> itemPos = new ArrayList<>();
        for (int i = 0; i < t.header().size(); i++) {
            if (i != pos[0] && i != pos[1]) {
                items.add(t.header().get(i).trim());
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
                    survey.put(items.get(k), Columns.number(t, row, itemPos.get(k), items.get(k), problems));
                }
            }
            out.add(new Candidate(id, level, survey));
            Columns.stopIfFull(problems);
        }
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        return new Result(out, items);
    }
}
