package org.inkgate.analysis.mfrm;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.inkgate.analysis.data.Rating;

/**
 * The ratings the classical analysis read, as {@link RatingData} for many-facet Rasch measurement,
 * so one file is read (and checked) once. Only the columns the model or a bias pair uses are
 * carried. The Rasch model needs what the classical statistics do not: whole-number scores from 0
 * and a value in every used column; ratings that break this make the analysis refused (with the
 * rating, candidate and column named), never silently dropped.
 */
public final class StudyRatings {

    /** Columns of the tidy ratings table besides candidate and score, in file order. */
    public static final List<String> COLUMNS = List.of("level", "form", "task", "condition", "rater", "criterion");
    private static final int PROBLEMS_LISTED = 10;

    private StudyRatings() {
    }

    /**
     * Builds the rating data.
     *
     * @param ratings   the ratings in input order (rating 1 is the first data row of the file)
     * @param levelOf   candidate to level from a candidate table, filling empty levels (may be empty)
     * @param columns   the columns to carry: modelled facets and bias columns other than candidate
     * @throws IllegalArgumentException a column that is not one of {@link #COLUMNS}
     * @throws MfrmRefusedException     scores that are not whole numbers from 0, or empty values in a used column
     */
    public static RatingData of(List<Rating> ratings, Map<String, String> levelOf, List<String> columns) {
        return of(ratings, levelOf, Map.of(), columns);
    }

    /**
     * Builds the rating data with candidates' categorical attributes as further grouping columns
     * (each rating gets its candidate's group), for bias pairs such as condition x first_language.
     *
     * @param attributes attribute name to candidate to group, from the candidate table
     */
    public static RatingData of(List<Rating> ratings, Map<String, String> levelOf,
            Map<String, Map<String, String>> attributes, List<String> columns) {
        for (String c : columns) {
            if (!COLUMNS.contains(c) && !attributes.containsKey(c)) {
                throw new IllegalArgumentException("'" + c + "' is not a column of the ratings or an attribute of the"
                        + " candidate table; use candidate, one of " + COLUMNS + " or one of " + attributes.keySet());
            }
        }
        List<String> cols = columns.stream().distinct().toList();
        RatingData.Builder b = RatingData.builder(cols);
        List<String> problems = new ArrayList<>();
        int more = 0;
        String[] values = new String[cols.size()];
        for (int i = 0; i < ratings.size(); i++) {
            Rating r = ratings.get(i);
            String where = "rating " + (i + 1) + " (candidate " + r.candidate() + ", task " + r.task() + ", rater "
                    + r.rater() + ", criterion " + r.criterion() + ")";
            String problem = null;
            for (int c = 0; c < cols.size() && problem == null; c++) {
                boolean attribute = !COLUMNS.contains(cols.get(c));
                values[c] = attribute ? attributes.get(cols.get(c)).get(r.candidate()) : value(r, cols.get(c), levelOf);
                if (values[c] == null || values[c].isBlank()) {
                    problem = attribute ? where + ": the candidate table gives no '" + cols.get(c) + "' for candidate "
                            + r.candidate() + "; give every rated candidate a value, or leave the pair out"
                            : where + ": column '" + cols.get(c) + "' is empty; every rating needs a value in a"
                            + " column that is modelled or used in a bias pair";
                }
            }
            double s = r.score();
            if (problem == null && (s != Math.rint(s) || s < 0 || s > Integer.MAX_VALUE)) {
                problem = where + ": score " + String.format(Locale.ROOT, "%s", s) + " is not a whole number from 0;"
                        + " the Rasch model needs category numbers 0, 1, 2, ... (rescore or map the scores first)";
            }
            if (problem != null) {
                if (problems.size() < PROBLEMS_LISTED) {
                    problems.add(problem);
                } else {
                    more++;
                }
                continue;
            }
            if (problems.isEmpty()) {
                b.add(r.candidate(), values.clone(), (int) s);
            }
        }
        if (more > 0) {
            problems.add(more + " more rating(s) with the same kind of problem");
        }
        if (!problems.isEmpty()) {
            throw new MfrmRefusedException(problems);
        }
        return b.build();
    }

    private static String value(Rating r, String column, Map<String, String> levelOf) {
        return switch (column) {
            case "level" -> r.level() == null || r.level().isBlank() ? levelOf.get(r.candidate()) : r.level();
            case "form" -> r.form();
            case "task" -> r.task();
            case "condition" -> r.condition();
            case "rater" -> r.rater();
            case "criterion" -> r.criterion();
            default -> throw new IllegalArgumentException("unknown column " + column);
        };
    }
}
