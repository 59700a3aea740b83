package org.inkgate.admin.core.qti;

import java.util.Optional;

/**
 * The reversible rule that turns Inkgate's ids (candidate numbers, exam, form, task and package
 * ids) into QTI identifiers, which the QTI 3.0 schemas type as {@code xs:NCName} (XML Namespaces
 * 1.0, "NCName": a letter or underscore first, then letters, digits, {@code . - _}).
 * <ul>
 *   <li>An id that starts with an ASCII letter and holds only {@code A-Z a-z 0-9 . - _} is used
 *       unchanged ({@code H1004} stays {@code H1004}).</li>
 *   <li>Any other id becomes {@code _} followed by the id with every character outside
 *       {@code A-Z a-z 0-9 . -} written as {@code _}, its Unicode code point in upper-case
 *       hexadecimal, and {@code _} ({@code 0042} becomes {@code _0042}, {@code 12_3} becomes
 *       {@code _12_5F_3}, {@code exam/A} becomes {@code _exam_2F_A}).</li>
 * </ul>
 * Unchanged ids start with a letter and encoded ones with {@code _}, so {@link #decode} gives the
 * original back for every identifier {@link #encode} made. docs/formats.md, "Identifiers in QTI".
 */
public final class QtiIdentifier {

    private QtiIdentifier() {
    }

    /** The QTI identifier of an id; never empty, always an NCName. */
    public static String encode(String id) {
        if (id == null || id.isEmpty()) {
            throw new IllegalArgumentException("an empty id has no QTI identifier");
        }
        if (isPlain(id)) {
            return id;
        }
        StringBuilder out = new StringBuilder(id.length() + 8).append('_');
        id.codePoints().forEach(c -> {
            if (isAsciiLetterOrDigit(c) || c == '.' || c == '-') {
                out.appendCodePoint(c);
            } else {
                out.append('_').append(Integer.toHexString(c).toUpperCase(java.util.Locale.ROOT)).append('_');
            }
        });
        return out.toString();
    }

    /**
     * The id an identifier stands for: the identifier itself when it starts with a letter, the
     * decoded rest when it starts with {@code _} and follows the rule, empty when it breaks it.
     */
    public static Optional<String> decode(String identifier) {
        if (identifier == null || identifier.isEmpty()) {
            return Optional.empty();
        }
        if (isPlain(identifier)) {
            return Optional.of(identifier);
        }
        if (identifier.charAt(0) != '_' || identifier.length() == 1) {
            return Optional.empty();
        }
        StringBuilder out = new StringBuilder();
        int i = 1;
        while (i < identifier.length()) {
            char c = identifier.charAt(i);
            if (c != '_') {
                if (!(isAsciiLetterOrDigit(c) || c == '.' || c == '-')) {
                    return Optional.empty();
                }
                out.append(c);
                i++;
                continue;
            }
            int end = identifier.indexOf('_', i + 1);
            if (end < 0 || end == i + 1 || end - i - 1 > 6) {
                return Optional.empty();
            }
            String hex = identifier.substring(i + 1, end);
            if (!hex.matches("[0-9A-F]+")) {
                return Optional.empty();
            }
            int cp = Integer.parseInt(hex, 16);
            if (!Character.isValidCodePoint(cp)) {
                return Optional.empty();
            }
            out.appendCodePoint(cp);
            i = end + 1;
        }
        String decoded = out.toString();
        // an encoded form of an id that encode() would have left plain is not ours: keep the rule one-to-one
        return isPlain(decoded) ? Optional.empty() : Optional.of(decoded);
    }

    /** Whether a string is an NCName in the ASCII subset the rule uses (what the schemas accept). */
    public static boolean isIdentifier(String s) {
        if (s == null || s.isEmpty()) {
            return false;
        }
        char first = s.charAt(0);
        if (!(isAsciiLetter(first) || first == '_')) {
            return false;
        }
        for (int i = 1; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!(isAsciiLetterOrDigit(c) || c == '.' || c == '-' || c == '_')) {
                return false;
            }
        }
        return true;
    }

    private static boolean isPlain(String s) {
        return isIdentifier(s) && isAsciiLetter(s.charAt(0));
    }

    private static boolean isAsciiLetter(int c) {
        return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z');
    }

    private static boolean isAsciiLetterOrDigit(int c) {
        return isAsciiLetter(c) || (c >= '0' && c <= '9');
    }
}
