package org.inkgate.client;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/** What the launcher was asked to do, parsed from its arguments. */
public sealed interface LaunchCommand {

    /** The usage text {@code --help} prints. */
    String USAGE = """
            Usage: inkgate-client --sitting FILE.inkexam --owner-key FINGERPRINT [--data FOLDER]
                   inkgate-client FILE.inkexam --owner-key FINGERPRINT [--data FOLDER]
                   inkgate-client --demo [--data FOLDER]
                   inkgate-client --practice [FILE.inkexam]
                   inkgate-client --installation [--seat LABEL] [--out FOLDER] [--data FOLDER]
                   inkgate-client --help | --version

              --sitting FILE.inkexam  open a live sitting: locked full screen, invigilator PIN, roster
              --owner-key FINGERPRINT the test owner's published key fingerprint; only a bundle signed
                                      by that key is opened (repeat the option to allow several)
              --data FOLDER           where this machine keeps sittings in progress, logs and local
                                      copies of response packages (default: the user's data folder)
              --demo                  open the invented demo exam as a locked sitting; its PIN and
                                      candidate numbers are printed here (DEMO ONLY, NOT SECRET)
              --practice              open the demo exam (invented content) in practice mode
              --practice FILE.inkexam open a practice bundle in practice mode
              --installation          print this installation's key fingerprint and write its enrolment
                                      file (installation-FINGERPRINT.inkenrol) for the test owner, who
                                      enrols it so that this machine's packages are trusted
              --seat LABEL            with --installation: the seat or machine label to record
                                      (default: the host name)
              --out FOLDER            with --installation: where to write the file (default: here)
              --help                  show this help
              --version               show the release number and the Java runtime

            A live sitting locks the window as far as an application can; the operating system's own
            kiosk or assigned-access setting must do the rest (see docs/invigilator-guide.md).
            Practice mode does not lock the machine and submits nothing; it opens only practice
            bundles.""";

    /** Print the usage text. */
    record ShowHelp() implements LaunchCommand {
    }

    /** Print the release number. */
    record ShowVersion() implements LaunchCommand {
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

    /** The locked sitting on the demo's live bundle, trusting the published demo key. */
    record DemoSitting(Path dataFolder) implements LaunchCommand {
    }

    /**
     * Show this installation's fingerprint and write its enrolment file.
     *
     * @param dataFolder   the data folder holding the installation key, or null for the default
     * @param seat         the seat or machine label, or null for the host name
     * @param outputFolder where the enrolment file goes
     */
    record ShowInstallation(Path dataFolder, String seat, Path outputFolder) implements LaunchCommand {
        public ShowInstallation {
            Objects.requireNonNull(outputFolder, "outputFolder");
        }
    }

    /**
     * A live sitting.
     *
     * @param bundle     the exam bundle
     * @param ownerKeys  fingerprints of the owner keys to trust
     * @param dataFolder the data folder, or null for the default
     */
    record Sitting(Path bundle, Set<String> ownerKeys, Path dataFolder) implements LaunchCommand {
        public Sitting {
            Objects.requireNonNull(bundle, "bundle");
            ownerKeys = Set.copyOf(ownerKeys);
        }
    }

    /**
     * Parses the launcher's arguments.
     *
     * @throws IllegalArgumentException with a message saying what is wrong and what to type instead
     */
    static LaunchCommand parse(List<String> args) {
        if (args.isEmpty()) {
            throw new IllegalArgumentException("no mode was given. Run with --sitting FILE.inkexam --owner-key"
                    + " FINGERPRINT for a live sitting, --demo for the demo sitting, or --practice to practise.");
        }
        String first = args.getFirst();
        return switch (first) {
            case "--help", "-h" -> onlyArgument(args, new ShowHelp());
            case "--version", "-V" -> onlyArgument(args, new ShowVersion());
            case "--practice" -> practice(args.subList(1, args.size()));
            case "--demo" -> demo(args.subList(1, args.size()));
            case "--sitting" -> sitting(args.subList(1, args.size()));
            case "--installation" -> installation(args.subList(1, args.size()));
            default -> {
                if (!first.startsWith("-")) {
                    yield sitting(args);
                }
                throw new IllegalArgumentException("unknown argument \"" + first
                        + "\". Use --sitting FILE.inkexam --owner-key FINGERPRINT, --demo, --practice [FILE.inkexam] or --help.");
            }
        };
    }

    private static LaunchCommand demo(List<String> rest) {
        Options options = Options.parse(rest);
        if (!options.files().isEmpty()) {
            throw new IllegalArgumentException("--demo opens the built-in demo bundle and takes no bundle file; got "
                    + String.join(" ", options.files()) + ". For another bundle use --sitting FILE.inkexam.");
        }
        if (!options.ownerKeys().isEmpty()) {
            throw new IllegalArgumentException("--demo trusts only the published demo key; leave out --owner-key.");
        }
        return new DemoSitting(options.dataFolder());
    }

    private static LaunchCommand installation(List<String> rest) {
        Path data = null;
        Path out = null;
        String seat = null;
        for (int i = 0; i < rest.size(); i++) {
            String arg = rest.get(i);
            switch (arg) {
                case "--data" -> data = Path.of(once(data, Options.value(rest, i++, arg), arg));
                case "--out" -> out = Path.of(once(out, Options.value(rest, i++, arg), arg));
                case "--seat" -> seat = once(seat, Options.value(rest, i++, arg), arg);
                default -> throw new IllegalArgumentException("--installation takes --seat LABEL, --out FOLDER and"
                        + " --data FOLDER; \"" + arg + "\" is not one of them.");
            }
        }
        return new ShowInstallation(data, seat, out == null ? Path.of("") : out);
    }

    private static String once(Object previous, String value, String option) {
        if (previous != null) {
            throw new IllegalArgumentException(option + " is given twice; give it once.");
        }
        return value;
    }

    private static LaunchCommand sitting(List<String> rest) {
        Options options = Options.parse(rest);
        if (options.files().size() != 1) {
            throw new IllegalArgumentException("a live sitting needs exactly one bundle file, got "
                    + (options.files().isEmpty() ? "none" : String.join(" ", options.files())) + ".");
        }
        if (options.ownerKeys().isEmpty()) {
            throw new IllegalArgumentException("a live sitting opens only bundles signed by the test owner's key:"
                    + " give the fingerprint the test owner published with --owner-key FINGERPRINT.");
        }
        return new Sitting(Path.of(options.files().getFirst()), options.ownerKeys(), options.dataFolder());
    }

    /** The options of --sitting and --demo. */
    record Options(List<String> files, Set<String> ownerKeys, Path dataFolder) {
        static Options parse(List<String> args) {
            List<String> files = new ArrayList<>();
            Set<String> keys = new LinkedHashSet<>();
            Path data = null;
            for (int i = 0; i < args.size(); i++) {
                String arg = args.get(i);
                switch (arg) {
                    case "--owner-key" -> keys.add(value(args, i++, arg));
                    case "--data" -> {
                        if (data != null) {
                            throw new IllegalArgumentException("--data is given twice; give one data folder.");
                        }
                        data = Path.of(value(args, i++, arg));
                    }
                    default -> {
                        if (arg.startsWith("-")) {
                            throw new IllegalArgumentException("unknown option \"" + arg
                                    + "\". A sitting takes --owner-key FINGERPRINT and --data FOLDER.");
                        }
                        files.add(arg);
                    }
                }
            }
            return new Options(files, keys, data);
        }

        private static String value(List<String> args, int i, String option) {
            if (i + 1 >= args.size() || args.get(i + 1).startsWith("--")) {
                throw new IllegalArgumentException(option + " needs a value after it.");
            }
            return args.get(i + 1);
        }
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
