package org.inkgate.client;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/** What the launcher was asked to do, parsed from its arguments. */
public sealed interface LaunchCommand {

    /** The usage text {@code --help} prints. */
    String USAGE = """
            Usage: inkgate-client --practice [FILE.inkexam]
                   inkgate-client --help

              --practice              open the built-in demo exam (invented content) in practice mode
              --practice FILE.inkexam open a practice bundle in practice mode
              --help                  show this help

            Practice mode does not lock the machine and submits nothing. It opens only practice
            bundles; a bundle made for a live sitting is refused. This version has no live mode yet.""";

    /** Print the usage text. */
    record ShowHelp() implements LaunchCommand {
    }

    /** Practise on the demo bundle built into the client. */
    record PracticeDemo() implements LaunchCommand {
    }

    /** Practise on the given bundle file. */
    record PracticeFile(Path bundle) implements LaunchCommand {
        public PracticeFile {
            Objects.requireNonNull(bundle, "bundle");
        }
    }

    /**
     * Parses the launcher's arguments.
     *
     * @throws IllegalArgumentException with a message saying what is wrong and what to type instead
     */
    static LaunchCommand parse(List<String> args) {
        if (args.isEmpty()) {
            throw new IllegalArgumentException("no mode was given. This version has only practice mode:"
                    + " run with --practice to open the demo exam, or --practice FILE.inkexam.");
        }
        String first = args.getFirst();
        return switch (first) {
            case "--help", "-h" -> onlyArgument(args, new ShowHelp());
            case "--practice" -> practice(args.subList(1, args.size()));
            default -> throw new IllegalArgumentException("unknown argument \"" + first
                    + "\". Use --practice [FILE.inkexam] or --help.");
        };
    }

    private static LaunchCommand practice(List<String> rest) {
        if (rest.isEmpty()) {
            return new PracticeDemo();
        }
        if (rest.size() > 1) {
            throw new IllegalArgumentException("--practice takes at most one bundle file, got " + rest.size()
                    + " arguments: " + String.join(" ", rest));
        }
        String file = rest.getFirst();
        if (file.startsWith("-")) {
            throw new IllegalArgumentException("\"" + file + "\" is not a bundle file. Use --practice"
                    + " FILE.inkexam, or --practice alone for the demo exam.");
        }
        return new PracticeFile(Path.of(file));
    }

    private static LaunchCommand onlyArgument(List<String> args, LaunchCommand command) {
        if (args.size() > 1) {
            throw new IllegalArgumentException(args.getFirst() + " takes no further arguments.");
        }
        return command;
    }
}
