package org.inkgate.format.bundle;

import java.util.Collection;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * How candidate numbers are compared, on both sides: the admin tool refusing a roster that lists
 * a candidate twice, the bundle's rules, and the client matching the number a candidate types at
 * sign-in. Spaces around a number and the letter case of its ASCII letters do not matter
 * ({@code d1001} is {@code D1001}): a number is typed from a printed slip, where case is not
 * something a candidate can be expected to reproduce, so two roster numbers that differ only in
 * case would be indistinguishable at the desk and are refused as duplicates. Dashes and
 * underscores do matter. The roster's own spelling is what the sitting records.
 */
public final class CandidateNumbers {

    private CandidateNumbers() {
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
