package org.inkgate.admin.core.csv;

import java.io.FilterWriter;
import java.io.Writer;

/**
 * The spreadsheet-safe form of a CSV export: a cell whose first character a spreadsheet may take as
 * the start of a formula ({@code = + - @}, tab, carriage return, NUL) gets a single quote in front, so
 * the cell is shown as text and never evaluated. The characters and the quote are the rule of OWASP's
 * "CSV Injection" page (owasp.org/www-community/attacks/CSV_Injection: {@code = + - @}, tab 0x09, carriage
 * return 0x0D) and of OWASP ASVS 5.0 requirement 1.2.10 (which adds NUL). Fields are then quoted by the
 * RFC 4180 rules as usual. The quote changes the data: programs (and {@code analyse}) read the plain
 * export; this form is for opening in a spreadsheet. docs/data-dictionary.md, "Opening the CSV files
 * in a spreadsheet".
 */
public final class SpreadsheetSafe {

    private SpreadsheetSafe() {
    }

    /** {@code value} with a leading single quote when its first character could start a formula. */
    public static String cell(String value) {
        if (value == null || value.isEmpty()) {
            return value;
        }
        char first = value.charAt(0);
        boolean formula = first == '=' || first == '+' || first == '-' || first == '@' || first == '\t' || first == '\r'
                || first == '\0';
        return formula ? "'" + value : value;
    }

    /** A writer that {@link Csv#writeRow} recognises: every cell written through it is made safe. */
    public static Writer writer(Writer out) {
        return new Marked(out);
    }

    static final class Marked extends FilterWriter {
        Marked(Writer out) {
            super(out);
        }
    }
}
