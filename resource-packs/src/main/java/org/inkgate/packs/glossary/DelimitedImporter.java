package org.inkgate.packs.glossary;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.IllformedLocaleException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Imports a term bank from CSV (RFC 4180: comma, double-quote quoting, quotes doubled inside)
 * or TSV (tab-separated, no quoting, as IANA's text/tab-separated-values), UTF-8, with a header
 * row. One row is one term; rows with the same {@code entry_id} form one concept. Columns (in
 * any order, names case-insensitive): {@value #COLUMN_LIST}. {@code language} and {@code term}
 * are required.
 *
 * <p>Reads everything before anything is built: a file that fails at row 70,000 reports that
 * row and produces no entries at all.
 */
public final class DelimitedImporter {
    static final String COLUMN_LIST = "entry_id, language, term, part_of_speech, definition, example, subject_field, note";
    private static final List<String> COLUMNS = List.of(COLUMN_LIST.split(", "));

    /** The two dialects. */
    public enum Dialect {
        /** RFC 4180 comma-separated values. */
        CSV,
        /** Tab-separated values without quoting. */
        TSV
    }

    private DelimitedImporter() {
    }

    /** The dialect a file name implies: {@code .tsv} or {@code .tab} is TSV, anything else CSV. */
    public static Dialect dialectOf(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".tsv") || name.endsWith(".tab") ? Dialect.TSV : Dialect.CSV;
    }

    /** Reads a whole file (UTF-8, optional byte-order mark). */
    public static List<GlossaryEntry> read(Path file, Dialect dialect) throws GlossaryImportException, IOException {
        var decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        try (Reader r = new BufferedReader(new java.io.InputStreamReader(Files.newInputStream(file), decoder))) {
            return read(r, file.toString(), dialect);
        } catch (CharacterCodingException e) {
            throw new GlossaryImportException(file.toString(), 0, 0, "is not UTF-8 text; save it as UTF-8 (" + e.getMessage() + ")");
        }
    }

    /** Reads from a reader; {@code where} names the source in error messages. */
    public static List<GlossaryEntry> read(Reader in, String where, Dialect dialect) throws GlossaryImportException, IOException {
        RecordReader records = new RecordReader(in, dialect == Dialect.CSV ? ',' : '\t', dialect == Dialect.CSV, where);
        List<String> header = records.next();
        if (header == null) {
            throw new GlossaryImportException(where, 1, 0, "the file is empty; the first row must name the columns: " + COLUMN_LIST);
        }
        if (!header.isEmpty() && header.get(0).startsWith("\uFEFF")) {
            header.set(0, header.get(0).substring(1));
        }
        Map<String, Integer> col = new HashMap<>();
        for (int i = 0; i < header.size(); i++) {
            String name = header.get(i).strip().toLowerCase(Locale.ROOT);
            if (!COLUMNS.contains(name)) {
                throw new GlossaryImportException(where, 1, i + 1, "unknown column \"" + header.get(i) + "\"; allowed columns are: " + COLUMN_LIST);
            }
            if (col.put(name, i) != null) {
                throw new GlossaryImportException(where, 1, i + 1, "column \"" + name + "\" appears twice");
            }
        }
        for (String required : List.of("language", "term")) {
            if (!col.containsKey(required)) {
                throw new GlossaryImportException(where, 1, 0, "the header has no \"" + required + "\" column; it is required");
            }
        }
        Map<String, Builder> entries = new LinkedHashMap<>();
        List<String> row;
        long rowNumber = 1;
        while ((row = records.next()) != null) {
            rowNumber++;
            long line = records.recordStartLine();
            if (row.size() == 1 && row.get(0).isBlank()) {
                continue; // blank line
            }
            if (row.size() != header.size()) {
                throw new GlossaryImportException(where, line, 0, "row " + rowNumber + " has " + row.size()
                        + " fields, the header has " + header.size() + "; check for a missing or extra "
                        + (dialect == Dialect.CSV ? "comma or an unclosed quote" : "tab"));
            }
            String term = cell(row, col, "term");
            String language = cell(row, col, "language");
            if (term == null) {
                throw rowError(where, line, rowNumber, col, "term", "is empty; every row needs a term");
            }
            if (language == null) {
                throw rowError(where, line, rowNumber, col, "language", "is empty; give a language tag such as en or es");
            }
            try {
                if (new Locale.Builder().setLanguageTag(language).build().getLanguage().isEmpty()) {
                    throw new IllformedLocaleException("no language subtag");
                }
            } catch (IllformedLocaleException e) {
                throw rowError(where, line, rowNumber, col, "language", "\"" + language + "\" is not a BCP 47 language tag (e.g. en, en-GB, es)");
            }
            String id = cell(row, col, "entry_id");
            if (id == null) {
                id = "row-" + rowNumber;
            }
            Builder b = entries.computeIfAbsent(id, Builder::new);
            String subject = cell(row, col, "subject_field");
            if (subject != null) {
                if (b.subject != null && !b.subject.equals(subject)) {
                    throw rowError(where, line, rowNumber, col, "subject_field", "\"" + subject + "\" differs from \"" + b.subject
                            + "\" given earlier for entry " + id + "; one entry has one subject field");
                }
                b.subject = subject;
            }
            SectionBuilder s = b.sections.computeIfAbsent(language, SectionBuilder::new);
            String definition = cell(row, col, "definition");
            if (definition != null) {
                if (s.definition != null && !s.definition.equals(definition)) {
                    throw rowError(where, line, rowNumber, col, "definition", "differs from the definition given earlier for entry "
                            + id + " in " + language + "; give it once, or the same text each time");
                }
                s.definition = definition;
            }
            String note = cell(row, col, "note");
            String tooLong = IndexLimits.tooLong("term", term);
            if (tooLong != null) {
                throw rowError(where, line, rowNumber, col, "term", tooLong);
            }
            s.terms.add(new GlossaryTerm(term, cell(row, col, "part_of_speech"), cell(row, col, "example"),
                    note == null ? List.of() : List.of(note), List.of()));
        }
        if (entries.isEmpty()) {
            throw new GlossaryImportException(where, 2, 0, "the file has a header but no rows");
        }
        List<GlossaryEntry> out = new ArrayList<>(entries.size());
        for (Builder b : entries.values()) {
            List<LanguageSection> sections = new ArrayList<>();
            for (SectionBuilder s : b.sections.values()) {
                sections.add(new LanguageSection(s.language, s.definition, List.of(), s.terms, List.of()));
            }
            out.add(new GlossaryEntry(b.id, b.subject, List.of(), sections, List.of()));
        }
        return out;
    }

    private static GlossaryImportException rowError(String where, long line, long row, Map<String, Integer> col, String column, String problem) {
        return new GlossaryImportException(where, line, col.getOrDefault(column, -1) + 1, "row " + row + ", column " + column + " " + problem);
    }

    private static String cell(List<String> row, Map<String, Integer> col, String name) {
        Integer i = col.get(name);
        if (i == null) {
            return null;
        }
        String v = row.get(i).strip();
        return v.isEmpty() ? null : v;
    }

    private static final class Builder {
        final String id;
        String subject;
        final Map<String, SectionBuilder> sections = new LinkedHashMap<>();

        Builder(String id) {
            this.id = id;
        }
    }

    private static final class SectionBuilder {
        final String language;
        String definition;
        final List<GlossaryTerm> terms = new ArrayList<>();

        SectionBuilder(String language) {
            this.language = language;
        }
    }

    /** Splits records; quoted fields may hold separators, doubled quotes and line breaks (CSV only). */
    private static final class RecordReader {
        private final Reader in;
        private final char separator;
        private final boolean quoting;
        private final String where;
        private long line = 1;
        private long recordStart = 1;
        private int pushback = -2;

        RecordReader(Reader in, char separator, boolean quoting, String where) {
            this.in = in;
            this.separator = separator;
            this.quoting = quoting;
            this.where = where;
        }

        long recordStartLine() {
            return recordStart;
        }

        private int read() throws IOException {
            if (pushback != -2) {
                int c = pushback;
                pushback = -2;
                return c;
            }
            return in.read();
        }

        List<String> next() throws IOException, GlossaryImportException {
            recordStart = line;
            int c = read();
            if (c == -1) {
                return null;
            }
            List<String> fields = new ArrayList<>();
            StringBuilder field = new StringBuilder();
            boolean quoted = false;
            boolean fieldWasQuoted = false;
            long quoteLine = line;
            while (true) {
                if (c == -1) {
                    if (quoted) {
                        throw new GlossaryImportException(where, quoteLine, 0, "a quoted field opened here is never closed; add the closing \"");
                    }
                    fields.add(field.toString());
                    return fields;
                }
                char ch = (char) c;
                if (quoted) {
                    if (ch == '"') {
                        int n = read();
                        if (n == '"') {
                            field.append('"');
                        } else {
                            quoted = false;
                            if (n != separator && n != '\r' && n != '\n' && n != -1) {
                                throw new GlossaryImportException(where, line, 0, "text after the closing quote of a field; "
                                        + "put the whole field in quotes, with any quote inside doubled (\"\"), as RFC 4180 says");
                            }
                            pushback = n;
                        }
                    } else {
                        if (ch == '\n') {
                            line++;
                        }
                        field.append(ch);
                    }
                } else if (ch == separator) {
                    fields.add(field.toString());
                    field.setLength(0);
                    fieldWasQuoted = false;
                } else if (ch == '\r' || ch == '\n') {
                    if (ch == '\r') {
                        int n = read();
                        if (n != '\n') {
                            pushback = n;
                        }
                    }
                    line++;
                    fields.add(field.toString());
                    return fields;
                } else if (quoting && ch == '"' && field.isEmpty() && !fieldWasQuoted) {
                    quoted = true;
                    fieldWasQuoted = true;
                    quoteLine = line;
                } else if (quoting && ch == '"') {
                    throw new GlossaryImportException(where, line, 0, "a quote (\") inside an unquoted field; quote the whole field "
                            + "and double the quote (\"\") as RFC 4180 says");
                } else {
                    field.append(ch);
                }
                c = read();
            }
        }
    }
}
