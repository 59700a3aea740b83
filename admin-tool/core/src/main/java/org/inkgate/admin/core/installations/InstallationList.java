package org.inkgate.admin.core.installations;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.enrolment.InstallationEnrolment;
import org.inkgate.format.io.AtomicFiles;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.trust.TrustPolicy;

/**
 * The installations a test owner trusts, kept as a text file (docs/formats.md, "Installations
 * list"): one fingerprint a line, optionally followed by {@code #} and a note; lines starting
 * with {@code #} and blank lines are ignored. {@code collect --installations FILE} reads it, and
 * enrolment files are added to it after their signature is checked, so a person can also read,
 * edit and review it.
 */
public final class InstallationList {

    /** One trusted installation and the note written beside it (may be empty). */
    public record Entry(String fingerprint, String note) {
    }

    /** What enrolling one file did. */
    public sealed interface Enrolled {
        /** The file's installation was added. */
        record Added(String file, InstallationEnrolment enrolment) implements Enrolled {
        }

        /** The installation was already in the list; nothing was added. */
        record AlreadyThere(String file, InstallationEnrolment enrolment) implements Enrolled {
        }
    }

    /** Files larger than this are not installation lists. */
    private static final long MAX_LIST_BYTES = 1 << 20;

    private InstallationList() {
    }

    /**
     * Reads the list.
     *
     * @throws IOException naming the file and line of anything that is not a fingerprint
     */
    public static List<Entry> read(Path list) throws IOException {
        if (Files.size(list) > MAX_LIST_BYTES) {
            throw new IOException(list + " is over " + MAX_LIST_BYTES + " bytes: it is not an installations list."
                    + " Give the file that  installations enrol  writes.");
        }
        List<String> lines = Files.readAllLines(list, StandardCharsets.UTF_8);
        Map<String, Entry> entries = new LinkedHashMap<>();
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            int hash = line.indexOf('#');
            String print = (hash < 0 ? line : line.substring(0, hash)).strip();
            String note = hash < 0 ? "" : line.substring(hash + 1).strip();
            try {
                String normal = Fingerprint.normalise(print);
                entries.putIfAbsent(normal, new Entry(normal, note));
            } catch (IllegalArgumentException e) {
                throw new IOException(list + ", line " + (i + 1) + ": \"" + shown(print, 80) + "\" is not an installation"
                        + " fingerprint (32 hex digits in groups, like 3f2a-09c1-...). Correct or delete the line, or"
                        + " start it with # to keep it as a note.");
            }
        }
        return List.copyOf(entries.values());
    }

    /** The trust policy that accepts exactly the installations in the list. */
    public static TrustPolicy policy(Path list) throws IOException {
        Set<String> prints = read(list).stream().map(Entry::fingerprint).collect(Collectors.toSet());
        return TrustPolicy.trusting(prints);
    }

    /**
     * Checks every enrolment file and, only when all are good, adds the new installations to the
     * list (created when missing). One bad file changes nothing, so the list is never half-updated.
     *
     * @throws FormatRefusal for the first file that is damaged, changed after writing or not an enrolment file
     */
    public static List<Enrolled> enrol(Path list, List<Path> files, Instant now) throws IOException, FormatRefusal {
        List<Entry> existing;
        try {
            existing = read(list);
        } catch (NoSuchFileException e) {
            existing = List.of();
        }
        Set<String> known = existing.stream().map(Entry::fingerprint).collect(Collectors.toSet());
        List<Enrolled> outcomes = new ArrayList<>();
        StringBuilder added = new StringBuilder();
        for (Path file : files) {
            String name = file.toString();
            if (!Files.isRegularFile(file)) {
                throw new IOException(name + ": there is no such file. Give the enrolment files (.inkenrol) that"
                        + "  inkgate-client --installation  wrote; nothing was added to " + list + ".");
            }
            InstallationEnrolment e = InstallationEnrolment.read(file);
            if (known.add(e.fingerprint())) {
                outcomes.add(new Enrolled.Added(name, e));
                added.append(e.fingerprint()).append("  # ").append(e.machine().isEmpty() ? "(no label)" : e.machine())
                        .append(e.hostName().isEmpty() ? "" : " (host " + e.hostName() + ")")
                        .append(", written ").append(e.createdAt()).append(", enrolled ")
                        .append(now.truncatedTo(java.time.temporal.ChronoUnit.SECONDS)).append('\n');
            } else {
                outcomes.add(new Enrolled.AlreadyThere(name, e));
            }
        }
        if (!added.isEmpty()) {
            byte[] before = Files.exists(list) ? Files.readAllBytes(list) : header();
            byte[] text = added.toString().getBytes(StandardCharsets.UTF_8);
            boolean needsBreak = before.length > 0 && before[before.length - 1] != '\n';
            AtomicFiles.write(list, out -> {
                out.write(before);
                if (needsBreak) {
                    out.write('\n');
                }
                out.write(text);
            });
        }
        return List.copyOf(outcomes);
    }

    private static byte[] header() {
        return ("# Inkgate installations list: the client installations whose response packages collect trusts.\n"
                + "# One fingerprint a line, then # and a note. Add installations with  inkgate-admin installations"
                + " enrol.\n").getBytes(StandardCharsets.UTF_8);
    }

    /**
     * Text from a file as it may appear on a terminal: control, format and unassigned characters
     * shown as '?', at most {@code limit} characters, so a hand-edited or hostile list cannot steer
     * the terminal.
     */
    public static String shown(String text, int limit) {
        StringBuilder b = new StringBuilder();
        text.codePoints().limit(limit).forEach(c -> b.appendCodePoint(Character.isISOControl(c)
                || Character.getType(c) == Character.FORMAT || Character.getType(c) == Character.UNASSIGNED
                || Character.getType(c) == Character.LINE_SEPARATOR
                || Character.getType(c) == Character.PARAGRAPH_SEPARATOR ? '?' : c));
        return text.codePointCount(0, text.length()) > limit ? b + "..." : b.toString();
    }
}
