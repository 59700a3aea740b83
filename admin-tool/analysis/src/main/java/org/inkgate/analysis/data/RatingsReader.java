package org.inkgate.analysis.data;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads the tidy ratings table: one row per rating, columns
 * {@code candidate,level,form,task,condition,rater,criterion,score} (any order, header names
 * case-insensitive; level and form may be empty; extra columns ignored). A candidate's empty
 * level is taken from their other rows when those give one. Every bad row is
 * reported with its row and column; if any is bad, nothing is returned.
 */
public final class RatingsReader {

    static final String[] COLUMNS = {"candidate", "level", "form", "task", "condition", "rater", "criterion", "score"};

    private RatingsReader() {
    }

    /** A candidate's empty-level rows take the level their other rows give (a level belongs to the candidate). */
    private static List<Rating> withLevelsFilled(List<Rating> ratings, Map<String, String> levelOf) {
        List<Rating> out = new ArrayList<>(ratings.size());
        for (Rating r : ratings) {
            String level = r.level().isEmpty() ? levelOf.get(r.candidate()) : null;
            out.add(level == null ? r : new Rating(r.candidate(), level, r.form(), r.task(), r.condition(), r.rater(),
                    r.criterion(), r.score()));
        }
        return out;
    }

    public static List<Rating> read(String file, Reader reader) throws IOException, InputRejected {
        CsvTable t = CsvTable.open(file, reader);
        List<InputProblem> problems = new ArrayList<>();
        int[] pos = Columns.require(t, problems, COLUMNS);
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        Columns cols = new Columns();
        List<Rating> out = new ArrayList<>();
        // per response its ratings and their rows: the same rater scoring the same criterion of the
        // same response twice is ambiguous, and a response is sat under one condition
        Map<ResponseKey, List<Rating>> byResponse = new HashMap<>();
        Map<ResponseKey, List<Long>> rowsOf = new HashMap<>();
        Map<String, String> levelOf = new HashMap<>();
        CsvTable.Row row;
        while ((row = t.next()) != null) {
            if (!Columns.widthOk(t, row, problems)) {
                Columns.stopIfFull(problems);
                continue;
            }
            int before = problems.size();
            String candidate = cols.text(t, row, pos[0], "candidate", true, problems);
            String level = cols.text(t, row, pos[1], "level", false, problems);
            String form = cols.text(t, row, pos[2], "form", false, problems);
            String task = cols.text(t, row, pos[3], "task", true, problems);
            String condition = cols.text(t, row, pos[4], "condition", true, problems);
            String rater = cols.text(t, row, pos[5], "rater", true, problems);
            String criterion = cols.text(t, row, pos[6], "criterion", true, problems);
            double score = Columns.number(t, row, pos[7], "score", problems);
            ScoreBounds.check(t, row, "score", score, problems);
            if (problems.size() == before) {
                ResponseKey key = new ResponseKey(candidate, task);
                List<Rating> earlierRatings = byResponse.computeIfAbsent(key, k -> new ArrayList<>(8));
                List<Long> earlierRows = rowsOf.computeIfAbsent(key, k -> new ArrayList<>(8));
                for (int i = 0; i < earlierRatings.size(); i++) {
                    Rating e = earlierRatings.get(i);
                    if (e.rater().equals(rater) && e.criterion().equals(criterion)) {
                        problems.add(new InputProblem(file, row.number(), "rater", "rater " + rater + " already scored "
                                + criterion + " of candidate " + candidate + ", task " + task + " in row "
                                + earlierRows.get(i) + "; keep one rating per rater, criterion and response"));
                        break;
                    }
                }
                if (!earlierRatings.isEmpty() && !earlierRatings.get(0).condition().equals(condition)) {
                    problems.add(new InputProblem(file, row.number(), "condition", "candidate " + candidate + ", task "
                            + task + " is under condition '" + condition + "' here but '"
                            + earlierRatings.get(0).condition() + "' in row " + earlierRows.get(0)
                            + "; a response is sat under one condition"));
                }
                // an empty level says nothing (filled below, or from the candidate table); only two
                // different levels given for one candidate conflict
                String lv = level.isEmpty() ? null : levelOf.putIfAbsent(candidate, level);
                if (lv != null && !lv.equals(level)) {
                    problems.add(new InputProblem(file, row.number(), "level", "candidate " + candidate + " has level '"
                            + level + "' here but '" + lv + "' in an earlier row; give each candidate one level"));
                }
                Rating rating = new Rating(candidate, level, form, task, condition, rater, criterion, score);
                earlierRatings.add(rating);
                earlierRows.add(row.number());
                out.add(rating);
            }
            Columns.stopIfFull(problems);
        }
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        if (out.isEmpty()) {
            throw new InputRejected(List.of(new InputProblem(file, 2, null, "no ratings below the header")));
        }
        return withLevelsFilled(out, levelOf);
    }
}
