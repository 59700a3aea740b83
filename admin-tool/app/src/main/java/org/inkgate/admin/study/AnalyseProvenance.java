package org.inkgate.admin.study;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;

/**
 * The report's first section: where its figures came from, so a reader can check and repeat the
 * run - the exam, every input file with its SHA-256 (FIPS 180-4), the options, seeds, software
 * version, date and time, and the command line that reproduces the run.
 */
public final class AnalyseProvenance {
    public static final String ID = "provenance";
    private static final Pattern PLAIN = Pattern.compile("[A-Za-z0-9_./:=,@%+-]+");

    private AnalyseProvenance() {
    }

    /**
     * @param examId the exam analysed, or null when not known (ratings from files only)
     * @param inputs option name to the file it named, in command-line order
     * @param args   the command's own arguments as given
     * @param version the software version line
     */
    public static Section section(String examId, Map<String, Path> inputs, List<String> args, String version, Instant when)
            throws IOException {
        Section.Builder s = Section.builder(ID, "Provenance");
        s.paragraph("Where this report's figures came from. Run the command below in the same folder with the same"
                + " files (same SHA-256) and software version to reproduce every figure; only this section's date"
                + " and time differ.");
        Table.Builder t = Table.builder("provenance_inputs", "Input files")
                .method("SHA-256 of each file's bytes as read", "FIPS 180-4")
                .columns("option", "file", "bytes", "SHA-256");
        Map<String, Object> files = new LinkedHashMap<>();
        for (Map.Entry<String, Path> in : inputs.entrySet()) {
            Path p = in.getValue();
            String sha = sha256(p);
            long size = Files.size(p);
            t.row(in.getKey(), p.toString(), size, sha);
            Map<String, Object> f = new LinkedHashMap<>();
            f.put("file", p.toString());
            f.put("bytes", size);
            f.put("sha256", sha);
            files.put(in.getKey(), f);
        }
        s.table(t.build());
        String command = "inkgate-admin analyse " + String.join(" ", args.stream().map(AnalyseProvenance::quoted).toList());
        String date = when.truncatedTo(ChronoUnit.SECONDS).toString();
        s.paragraph("Exam: " + (examId == null ? "not known (the ratings came from files, not a results store)" : examId)
                + ".");
        s.paragraph("Software: " + version + " on Java " + System.getProperty("java.version") + ". Run at " + date
                + " (UTC).");
        s.paragraph("Seeds: none - the analysis draws no random numbers, so the same inputs give the same figures.");
        s.paragraph("Command line (options as given; defaults apply to the rest): " + command);
        s.put("exam", examId);
        s.put("inputs", files);
        s.put("software", version);
        s.put("java", System.getProperty("java.version"));
        s.put("date_time_utc", date);
        s.put("seeds", List.of());
        s.put("command_line", command);
        s.put("arguments", new ArrayList<>(args));
        return s.build();
    }

    /** A POSIX shell word: as is when plain, else single-quoted. */
    public static String quoted(String arg) {
        return PLAIN.matcher(arg).matches() ? arg : "'" + arg.replace("'", "'\\''") + "'";
    }

    private static String sha256(Path p) throws IOException {
        MessageDigest md;
        try {
            md = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("the Java runtime has no SHA-256", e);
        }
        try (InputStream in = Files.newInputStream(p)) {
            byte[] buf = new byte[1 << 16];
            int n;
            while ((n = in.read(buf)) > 0) {
                md.update(buf, 0, n);
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }
}
