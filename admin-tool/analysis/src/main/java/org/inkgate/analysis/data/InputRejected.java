package org.inkgate.analysis.data;

import java.util.List;

/** An input table was refused; nothing was read from it. Holds every problem found (up to a limit). */
public final class InputRejected extends Exception {

    private static final long serialVersionUID = 1L;
    private final transient List<InputProblem> problems;

    public InputRejected(List<InputProblem> problems) {
        super(summary(problems));
        this.problems = List.copyOf(problems);
    }

    public List<InputProblem> problems() {
        return problems;
    }

    private static String summary(List<InputProblem> problems) {
        StringBuilder b = new StringBuilder(problems.size() + " problem(s) in the input; nothing was analysed:");
        problems.stream().limit(20).forEach(p -> b.append(System.lineSeparator()).append("  ").append(p.describe()));
        if (problems.size() > 20) {
            b.append(System.lineSeparator()).append("  ... and ").append(problems.size() - 20).append(" more");
        }
        return b.toString();
    }
}
