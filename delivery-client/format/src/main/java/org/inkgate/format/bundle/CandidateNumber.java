package org.inkgate.format.bundle;

import java.util.Collection;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * The one rule for candidate numbers, wherever they come from: the roster CSV, a bundle's roster, the
 * sign-in of an open sitting, a response package.
 *
 * <p>What a number may hold: a candidate number names files in exports and is printed on terminals,
 * so it holds only characters that are safe in both: 1-32 ASCII letters, digits, {@code -} or
 * {@code _}, starting with a letter or digit.
 *
 * <p>How numbers are compared, on both sides (the admin tool refusing a roster that lists a candidate
 * twice, the bundle's rules, the client matching the number typed at sign-in): spaces around a
 * number and the letter case of its ASCII letters do not matter ({@code d1001} is {@code D1001}). A
 * number is typed from a printed slip, where case is not something a candidate can be expected to
 * reproduce, so two roster numbers that differ only in case would be indistinguishable at the desk
 * and are refused as duplicates. Dashes and underscores do matter. The roster's own spelling is what
 * the sitting records.
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

    /** The form two numbers are compared in: stripped, ASCII letters upper-cased. */
    public static String key(String number) {
        return Objects.requireNonNull(number, "number").strip().toUpperCase(Locale.ROOT);
    }

    /** True when the two numbers name the same candidate. */
    public static boolean same(String a, String b) {
        return key(a).equals(key(b));
    }

    /** The roster entry for the number typed, if the roster lists it. */
    public static Optional<RosterEntry> find(Collection<RosterEntry> roster, String typed) {
        String key = key(typed);
        return roster.stream().filter(r -> r.candidateNumber() != null && key(r.candidateNumber()).equals(key))
                .findFirst();
    }
}
