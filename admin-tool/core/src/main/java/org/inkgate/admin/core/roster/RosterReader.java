package org.inkgate.admin.core.roster;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.inkgate.format.bundle.CandidateNumber;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.source.Problem;

/**
 * Imports a roster CSV (RFC 4180, header row, UTF-8). Required columns: {@code candidate_number},
 * {@code level}; optional: {@code first_language}, {@code extra_time_percent}, {@code large_print},
 * {@code high_contrast}; any other column is kept as a personal field. Every bad row is reported
 * with its line and column; nothing is returned unless every row is good.
 */
public final class RosterReader {

    public static final String CANDIDATE = "candidate_number";
    public static final String LEVEL = "level";
    public static final String FIRST_LANGUAGE = "first_language";
    public static final String EXTRA_TIME = "extra_time_percent";
    public static final String LARGE_PRINT = "large_print";
    public static final String HIGH_CONTRAST = "high_contrast";
    private static final Set<String> KNOWN = Set.of(CANDIDATE, LEVEL, FIRST_LANGUAGE, EXTRA_TIME, LARGE_PRINT, HIGH_CONTRAST);
    /** Candidate numbers are typed at sign-in and become file and id parts: keep them plain. */

    private RosterReader() {
    }

    public static List<RosterCandidate> read(Path file) throws InvalidSourceException {
        String name = file.getFileName().toString();
        String text;
        try {
            text = org.inkgate.format.io.Utf8Text.decode(name, Files.readAllBytes(file));
        } catch (org.inkgate.format.io.Utf8Text.NotUtf8Exception e) {
            throw new InvalidSourceException("the roster " + file + " cannot be used",
                    List.of(new Problem(name, (int) e.line(), 0, "", e.getMessage().substring(name.length() + 1))));
        } catch (IOException e) {
            throw new InvalidSourceException("the roster " + file + " cannot be used",
                    List.of(new Problem(name, 0, 0, "", "cannot be read: " + e.getMessage())));
        }
        return parse(name, text);
    }

    public static List<RosterCandidate> parse(String name, String text) throws InvalidSourceException {
        List<Problem> problems = new ArrayList<>();
        List<Csv.Row> rows;
        try {
            rows = Csv.parse(text);
        } catch (Csv.CsvSyntaxException e) {
            throw new InvalidSourceException("the roster " + name + " cannot be used",
                    List.of(new Problem(name, e.line(), 0, "", e.getMessage())));
        }
        if (rows.isEmpty()) {
            throw new InvalidSourceException("the roster " + name + " cannot be used",
                    List.of(new Problem(name, 1, 0, "", "is empty; the first line names the columns, e.g. candidate_number,level")));
        }
        List<String> header = rows.get(0).fields().stream().map(h -> h.strip().toLowerCase(Locale.ROOT)).toList();
        Map<String, Integer> col = new HashMap<>();
        for (int i = 0; i < header.size(); i++) {
            if (header.get(i).isEmpty()) {
                problems.add(new Problem(name, 1, i + 1, "", "column " + (i + 1) + " has no name; name it or delete it"));
            } else if (col.putIfAbsent(header.get(i), i) != null) {
                problems.add(new Problem(name, 1, i + 1, header.get(i), "this column appears twice; keep one"));
            }
        }
        for (String required : List.of(CANDIDATE, LEVEL)) {
            if (!col.containsKey(required)) {
                problems.add(new Problem(name, 1, 0, required, "the column is missing from the first line; add it"
                        + Csv.semicolonHint(header)));
            }
        }
        if (!problems.isEmpty()) {
            throw new InvalidSourceException("the roster " + name + " cannot be used", problems);
        }
        List<RosterCandidate> out = new ArrayList<>();
        Map<String, Integer> seen = new HashMap<>();
        for (Csv.Row row : rows.subList(1, rows.size())) {
            int line = row.line();
            if (problems.size() >= org.inkgate.admin.core.csv.ProblemLimit.MAX) {
                problems.add(new Problem(name, line, 0, "", org.inkgate.admin.core.csv.ProblemLimit.STOPPED));
                break;
            }
            List<String> f = row.fields();
            if (f.size() != header.size()) {
                problems.add(new Problem(name, line, 0, "", "has " + f.size() + " fields but the header has "
                        + header.size() + "; check for a missing or extra comma, or quote a field that holds a comma"));
                continue;
            }
            int before = problems.size();
            String number = f.get(col.get(CANDIDATE)).strip();
            if (!CandidateNumber.isValid(number)) {
                problems.add(new Problem(name, line, col.get(CANDIDATE) + 1, CANDIDATE, "\""
                        + org.inkgate.format.refusal.FormatRefusal.printable(number)
                        + "\" is not a usable candidate number: use " + CandidateNumber.RULE));
            } else {
                // the client matches the number typed at sign-in this way, so the roster keeps numbers apart this way
                Integer first = seen.putIfAbsent(CandidateNumber.key(number), line);
                if (first != null) {
                    problems.add(new Problem(name, line, col.get(CANDIDATE) + 1, CANDIDATE, "candidate " + number
                            + " is already on line " + first + " (letter case does not tell candidates apart);"
                            + " each candidate appears once"));
                }
            }
            String level = f.get(col.get(LEVEL)).strip();
            if (level.isEmpty()) {
                problems.add(new Problem(name, line, col.get(LEVEL) + 1, LEVEL,
                        "is empty; give the proficiency level forms are balanced within (e.g. B1)"));
            }
            String language = value(f, col, FIRST_LANGUAGE);
            int extra = 0;
            String extraText = value(f, col, EXTRA_TIME);
            if (!extraText.isEmpty()) {
                try {
                    extra = Integer.parseInt(extraText);
                    if (extra < 0 || extra > 400) {
                        throw new NumberFormatException();
                    }
                } catch (NumberFormatException e) {
                    problems.add(new Problem(name, line, col.get(EXTRA_TIME) + 1, EXTRA_TIME, "\"" + extraText
                            + "\" is not a whole percentage from 0 to 400 (25 means a quarter more time)"));
                }
            }
            Boolean large = flag(name, line, f, col, LARGE_PRINT, problems);
            Boolean contrast = flag(name, line, f, col, HIGH_CONTRAST, problems);
            Map<String, String> personal = new LinkedHashMap<>();
            for (int i = 0; i < header.size(); i++) {
                if (!KNOWN.contains(header.get(i))) {
                    personal.put(header.get(i), f.get(i));
                }
            }
            if (problems.size() == before) {
                out.add(new RosterCandidate(number, level, language, extra, large, contrast, personal));
            }
        }
        if (!problems.isEmpty()) {
            throw new InvalidSourceException("the roster " + name + " cannot be used", problems);
        }
        return out;
    }

    private static String value(List<String> f, Map<String, Integer> col, String column) {
        Integer i = col.get(column);
        return i == null ? "" : f.get(i).strip();
    }

    private static Boolean flag(String name, int line, List<String> f, Map<String, Integer> col, String column,
            List<Problem> problems) {
        String v = value(f, col, column).toLowerCase(Locale.ROOT);
        return switch (v) {
            case "", "no", "false", "0", "n" -> false;
            case "yes", "true", "1", "y" -> true;
            default -> {
                problems.add(new Problem(name, line, col.get(column) + 1, column, "\"" + v + "\" is not yes or no"));
                yield false;
            }
        };
    }
}
