package org.inkgate.admin.core.source;

import java.util.List;

/** Thrown when a folder or input file has problems; carries every problem found, not just the first. */
public final class InvalidSourceException extends Exception {

    private final transient List<Problem> problems;

    public InvalidSourceException(String what, List<Problem> problems) {
        super(what + ": " + problems.size() + " problem" + (problems.size() == 1 ? "" : "s") + System.lineSeparator()
                + String.join(System.lineSeparator(), problems.stream().map(p -> "  " + p).toList()));
        this.problems = List.copyOf(problems);
    }

    public List<Problem> problems() {
        return problems;
    }
}
