package org.inkgate.format.bundle;

import java.util.regex.Pattern;

/**
 * The one rule for candidate numbers, wherever they come from: the roster CSV, a bundle's roster, the
 * sign-in of an open sitting, a response package. A candidate number names files in exports and is
 * printed on terminals, so it holds only characters that are safe in both: 1-32 ASCII letters,
 * digits, {@code -} or {@code _}, starting with a letter or digit.
 */
public final class CandidateNumber {

    /** The rule as people read it, for messages. */
    public static final String RULE = "1-32 letters, digits, '-' or '_', starting with a letter or digit";

    private static final Pattern PATTERN = Pattern.compile("[A-Za-z0-9][A-Za-z0-9_-]{0,31}");

    private CandidateNumber() {
    }

    /** Whether {@code number} keeps the rule. */
    public static boolean isValid(String number) {
        return number != null && PATTERN.matcher(number).matches();
    }
}
