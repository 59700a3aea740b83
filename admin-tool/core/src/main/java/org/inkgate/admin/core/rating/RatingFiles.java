package org.inkgate.admin.core.rating;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.format.io.OwnerOnly;
import org.inkgate.format.io.Utf8Text;

/**
 * The rating files a test owner hands out and takes back (a rater's sheet with its scripts, a
 * filled sheet, the ratings and final scores): written and read the same way, with the same
 * lines for people, by {@code rate sheet}, {@code rate export} and the admin window.
 */
public final class RatingFiles {

    private RatingFiles() {
    }

    /** Writes {@code rater}'s sheet to {@code file} and the scripts folder beside it; returns the summary. */
    public static List<String> exportSheet(RatingStore s, String rater, Path file) throws RatingException, IOException {
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        OwnerOnly.file(file);
        int rows;
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            rows = RatingSheets.export(s, rater, w);
        }
        List<String> out = new ArrayList<>();
        out.add("Sheet for rater " + rater + " written to " + file + " (" + rows + " responses). Scores:");
        for (ExamSource.Criterion c : s.rubric().criteria()) {
            out.add("  " + c.id() + " (" + c.name() + "): whole numbers " + c.minScore() + "-" + c.maxScore());
        }
        RatingScripts.Written scripts = RatingScripts.write(s, s.rubric(), rater, RatingScripts.folderFor(file));
        OwnerOnly.tree(scripts.folder());
        out.add("The response texts (" + scripts.scripts() + " files), the rubric and an index are in "
                + scripts.folder() + ", under blind ids only: hand the sheet and this folder to the rater.");
        return out;
    }

    /** Reads a filled sheet back (every row checked; nothing stored if any row is bad); returns the summary. */
    public static String importSheet(RatingStore s, String rater, Path file) throws RatingException, IOException {
        String text = Utf8Text.read(file);
        RatingSheets.Imported r = RatingSheets.importSheet(s, rater, file.getFileName().toString(), text);
        return "Read " + r.rowsRead() + " rows: " + r.storedNewOrChanged() + " ratings stored (new or changed), "
                + r.notYetRated() + " not yet rated, the rest unchanged.";
    }

    /** Writes ratings.csv and final-scores.csv into {@code dir}; returns the summary (with a note on pending ones). */
    public static List<String> exportScores(RatingStore s, Path dir) throws RatingException, IOException {
        OwnerOnly.folder(dir);
        OwnerOnly.file(dir.resolve("ratings.csv"));
        OwnerOnly.file(dir.resolve("final-scores.csv"));
        long ratings;
        long finals;
        try (Writer w = Files.newBufferedWriter(dir.resolve("ratings.csv"), StandardCharsets.UTF_8)) {
            ratings = RatingExport.ratings(s, w);
        }
        try (Writer w = Files.newBufferedWriter(dir.resolve("final-scores.csv"), StandardCharsets.UTF_8)) {
            finals = RatingExport.finalScores(s, w);
        }
        List<String> out = new ArrayList<>();
        out.add("ratings.csv " + ratings + " rows, final-scores.csv " + finals + " rows in " + dir);
        int pending = s.pendingResponses();
        if (pending > 0) {
            out.add("NOTE: " + pending + " response(s) have no final score yet and are not in final-scores.csv.");
        }
        return out;
    }
}
