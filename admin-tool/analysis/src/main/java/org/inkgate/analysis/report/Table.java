package org.inkgate.analysis.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * One table of the report: an id (also the CSV file name), a title (the HTML caption), the method
 * and its source, the columns (full-word label for the HTML, snake_case name for the CSV: see
 * {@link Column}), rows of cells (String, Number or null), and notes (cautions, how to read it).
 * Doubles keep full precision here; the HTML rounds them, the CSV does not.
 */
public record Table(String id, String title, String method, String source, List<Column> header,
        List<List<Object>> rows, List<String> notes) {

    public Table {
        Objects.requireNonNull(id, "id");
        if (!id.matches("[a-z0-9][a-z0-9_-]*")) {
            throw new IllegalArgumentException("table id must be lower-case letters, digits, - or _: " + id);
        }
        header = List.copyOf(header);
        if (title == null || title.isBlank()) {
            throw new IllegalArgumentException("table " + id + " needs a title: it is the table's caption");
        }
        java.util.Set<String> names = new java.util.HashSet<>();
        for (Column c : header) {
            if (!names.add(c.name())) {
                throw new IllegalArgumentException("table " + id + ": two columns share the CSV name " + c.name()
                        + "; give one of them its own name with Column.of(label, name)");
            }
        }
        rows = rows.stream().map(r -> java.util.Collections.unmodifiableList(new ArrayList<>(r))).toList();
        notes = List.copyOf(notes);
        for (List<Object> r : rows) {
            if (r.size() != header.size()) {
                throw new IllegalArgumentException("table " + id + ": a row has " + r.size() + " cells for "
                        + header.size() + " columns");
            }
        }
    }

    /** The columns' labels, as the HTML shows them. */
    public List<String> columns() {
        return header.stream().map(Column::label).toList();
    }

    /** The columns' CSV names. */
    public List<String> names() {
        return header.stream().map(Column::name).toList();
    }

    /** Added to every table with a value that cannot be computed (shown as a dash, empty in CSV, null in JSON). */
    public static final String UNDEFINED_NOTE = "A dash marks a value that cannot be computed for these data (too few"
            + " values, no variance, nothing to count); the notes above give the reason where a method reports one.";

    /** A builder, since tables grow row by row. */
    public static Builder builder(String id, String title) {
        return new Builder(id, title);
    }

    /** Collects rows and notes. */
    public static final class Builder {
        private final String id;
        private final String title;
        private String method = "";
        private String source = "";
        private List<Column> columns = List.of();
        private final List<List<Object>> rows = new ArrayList<>();
        private final List<String> notes = new ArrayList<>();

        private Builder(String id, String title) {
            this.id = id;
            this.title = title;
        }

        public Builder method(String method, String source) {
            this.method = method;
            this.source = source;
            return this;
        }

        /** Columns by label; each CSV name is the label in snake case ({@link Column#of(String)}). */
        public Builder columns(String... columns) {
            this.columns = java.util.Arrays.stream(columns).map(Column::of).toList();
            return this;
        }

        /** Columns with their own labels and CSV names (see {@link StatisticColumns}). */
        public Builder columns(Column... columns) {
            this.columns = List.of(columns);
            return this;
        }

        public Builder columns(List<Column> columns) {
            this.columns = List.copyOf(columns);
            return this;
        }

        public Builder row(Object... cells) {
            rows.add(java.util.Arrays.asList(cells));
            return this;
        }

        public Builder note(String note) {
            if (note != null && !note.isBlank() && !notes.contains(note)) {
                notes.add(note);
            }
            return this;
        }

        public Builder notes(List<String> notes) {
            notes.forEach(this::note);
            return this;
        }

        public boolean isEmpty() {
            return rows.isEmpty();
        }

        public Table build() {
            boolean undefined = rows.stream().flatMap(List::stream)
                    .anyMatch(c -> c instanceof Double d && !Double.isFinite(d));
            if (undefined) {
                note(UNDEFINED_NOTE);
            }
            return new Table(id, title, method, source, columns, rows, notes);
        }
    }
}
