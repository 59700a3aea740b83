package org.inkgate.analysis.mfrm;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the tidy ratings table: a header with {@code candidate}, {@code score} and any other
 * columns (typically {@code level,form,task,condition,rater,criterion}), then one rating per line.
 * Fields are comma-separated; a field may be wrapped in double quotes (a doubled quote inside is
 * one quote). Any bad line stops the read with its line number and column name.
 */
public final class RatingCsvReader {

    /** The column order the admin tool writes; other orders and extra columns are accepted too. */
    public static final List<String> TIDY_HEADER =
            List.of("candidate", "level", "form", "task", "condition", "rater", "criterion", "score");

    private RatingCsvReader() {
    }

    /** Reads all ratings; {@code source} names the file in error messages. */
    public static RatingData read(Reader in, String source) throws IOException {
        BufferedReader reader = new BufferedReader(in);
        String headerLine = reader.readLine();
        if (headerLine == null) {
            throw new RatingFormatException(source + ": the file is empty; expected a header line such as "
                    + String.join(",", TIDY_HEADER));
        }
        if (headerLine.startsWith("\uFEFF")) {
            headerLine = headerLine.substring(1);
        }
        List<String> header = split(headerLine, source, 1);
        int candidateAt = header.indexOf(RatingData.CANDIDATE);
        int scoreAt = header.indexOf("score");
        if (candidateAt < 0 || scoreAt < 0) {
            throw new RatingFormatException(source + ", line 1: the header needs columns 'candidate' and 'score'"
                    + " (found " + header + ")");
        }
        List<String> columns = new ArrayList<>();
        for (int i = 0; i < header.size(); i++) {
            String name = header.get(i).trim();
            if (name.isEmpty()) {
                throw new RatingFormatException(source + ", line 1, column " + (i + 1) + ": empty column name");
            }
            if (i != candidateAt && i != scoreAt) {
                if (columns.contains(name)) {
                    throw new RatingFormatException(source + ", line 1: column '" + name + "' appears twice");
                }
                columns.add(name);
            }
        }
        RatingData.Builder builder = RatingData.builder(columns);
        String line;
        int lineNo = 1;
        while ((line = reader.readLine()) != null) {
            lineNo++;
            if (line.isBlank()) {
                continue;
            }
            List<String> fields = split(line, source, lineNo);
            if (fields.size() != header.size()) {
                throw new RatingFormatException(source + ", line " + lineNo + ": " + fields.size()
                        + " fields, the header has " + header.size());
            }
            String[] values = new String[columns.size()];
            int v = 0;
            for (int i = 0; i < fields.size(); i++) {
                String f = fields.get(i).trim();
                if (f.isEmpty()) {
                    throw new RatingFormatException(source + ", line " + lineNo + ", column '" + header.get(i)
                            + "': empty value; every rating needs every column");
                }
                if (i != candidateAt && i != scoreAt) {
                    values[v++] = f;
                }
            }
            String scoreText = fields.get(scoreAt).trim();
            int score;
            try {
                score = Integer.parseInt(scoreText);
            } catch (NumberFormatException e) {
                throw new RatingFormatException(source + ", line " + lineNo + ", column 'score': '" + scoreText
                        + "' is not a whole number; scores are category numbers 0, 1, 2, ...");
            }
            if (score < 0) {
                throw new RatingFormatException(source + ", line " + lineNo + ", column 'score': " + score
                        + " is negative; scores are category numbers 0, 1, 2, ...");
            }
            builder.add(fields.get(candidateAt).trim(), values, score);
        }
        if (lineNo == 1) {
            throw new RatingFormatException(source + ": the header is the only line; there are no ratings");
        }
        return builder.build();
    }

    private static List<String> split(String line, String source, int lineNo) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        boolean wasQuoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        cur.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    cur.append(c);
                }
            } else if (c == '"' && cur.toString().isBlank() && !wasQuoted) {
                quoted = true;
                wasQuoted = true;
                cur.setLength(0);
            } else if (c == ',') {
                out.add(cur.toString());
                cur.setLength(0);
                wasQuoted = false;
            } else {
                cur.append(c);
            }
        }
        if (quoted) {
            throw new RatingFormatException(source + ", line " + lineNo + ": a quoted field is not closed");
        }
        out.add(cur.toString());
        return out;
    }

    /** A line of the ratings file that cannot be read; the message names file, line and column. */
    public static final class RatingFormatException extends IllegalArgumentException {
        RatingFormatException(String message) {
            super(message);
        }
    }
}
