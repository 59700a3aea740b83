package org.inkgate.analysis.report;

import java.text.Normalizer;
import java.util.Locale;
import java.util.Objects;

/**
 * One column of a report table: the label a reader sees in the HTML (full words), the stable
 * snake_case name the CSV header carries, an optional heading that groups neighbouring columns in
 * the HTML (and a narrower subheading under it), and whether its cells are p-values (shown by {@link PValueText}). Statistics that
 * several tables share are defined once in {@link StatisticColumns}; a one-off column takes
 * {@link #of(String)}, whose name follows {@link #snakeCase(String)} (docs/analysis.md, "Table
 * columns").
 */
public record Column(String label, String name, String group, String subgroup, boolean pValue) {

    public Column {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(name, "name");
        group = group == null ? "" : group;
        subgroup = subgroup == null ? "" : subgroup;
        if (!name.matches("[a-z][a-z0-9]*(_[a-z0-9]+)*")) {
            throw new IllegalArgumentException("CSV column name '" + name + "' (label '" + label + "') must be"
                    + " snake_case: lower-case letters and digits joined by single underscores, starting with a letter");
        }
    }

    /** A column with this label and name. */
    public static Column of(String label, String name) {
        return new Column(label, name, "", "", false);
    }

    /** A column whose CSV name is the label in snake case; a label ending in "p" (e.g. "Welch p") is a p-value. */
    public static Column of(String label) {
        return new Column(label, snakeCase(label), "", "", looksLikePValue(label));
    }

    /** A p-value column with this label and name. */
    public static Column pValue(String label, String name) {
        return new Column(label, name, "", "", true);
    }

    /** The same column under a group heading (HTML only; the CSV keeps one header row). */
    public Column in(String heading) {
        return new Column(label, name, heading, subgroup, pValue);
    }

    /** The same column under a second, narrower heading (HTML only), e.g. the measure over "mean" and "SD". */
    public Column under(String subheading) {
        return new Column(label, name, group, subheading, pValue);
    }

    /** The same column with another label and name prefix, e.g. "mean" of a measure: "time on task mean". */
    public Column prefixed(String labelPrefix, String namePrefix) {
        return new Column(labelPrefix + label, namePrefix + name, group, subgroup, pValue);
    }

    /**
     * The CSV name of a label: lower case, accents dropped, "^2" as "_squared", "|x|" as "abs_x",
     * " - " as "_minus_", "%" as "percent", apostrophes dropped, every other run of characters
     * outside a-z and 0-9 as one underscore, and "column" in front of a leading digit.
     */
    public static String snakeCase(String label) {
        String s = Normalizer.normalize(label, Normalizer.Form.NFD).replaceAll("\\p{M}+", "")
                .toLowerCase(Locale.ROOT)
                .replace("^2", " squared").replace(" - ", " minus ").replace("%", " percent ")
                .replace("'", "").replace("\u2019", "").replaceAll("\\|([^|]+)\\|", "abs $1")
                .replace("<", " lt ").replace(">", " gt ")
                .replaceAll("[^a-z0-9]+", "_").replaceAll("^_+|_+$", "");
        if (s.isEmpty()) {
            return "column";
        }
        return Character.isDigit(s.charAt(0)) ? "column_" + s : s;
    }

    private static boolean looksLikePValue(String label) {
        String core = label.replaceAll("\\s*\\([^)]*\\)\\s*$", "").trim();
        return core.equals("p") || core.endsWith(" p");
    }
}
