package org.inkgate.admin.core.rating;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.format.io.AtomicFiles;

/**
 * The scripts a sheet rater reads: beside the sheet, a folder with one plain-text document per
 * response of the rater's queue, named and headed by its blind id only, plus the rubric and an
 * index in working order. Nothing in them comes from the candidate's record (number, name, level,
 * form, condition, times): only the task's title and the text the candidate wrote, which may itself
 * reveal an identity; that is what a referral is for.
 */
public final class RatingScripts {

    /** What was written: the folder and the number of scripts. */
    public record Written(Path folder, int scripts) {
    }

    private RatingScripts() {
    }

    /** The folder beside {@code sheet}: the sheet's name without .csv, then "-scripts". */
    public static Path folderFor(Path sheet) {
        String name = sheet.getFileName().toString();
        String base = name.toLowerCase(java.util.Locale.ROOT).endsWith(".csv") ? name.substring(0, name.length() - 4) : name;
        Path parent = sheet.toAbsolutePath().getParent();
        return parent.resolve(base + "-scripts");
    }

    /** Writes the rater's queue into {@code folder} (created); the rater's own earlier files there are replaced. */
    public static Written write(RatingDesk desk, ExamSource.Rubric rubric, String raterId, Path folder)
            throws RatingException, IOException {
        Files.createDirectories(folder);
        List<String> index = new ArrayList<>();
        index.add("Scripts for rater " + raterId + ", in working order (score them on the sheet under the same id).");
        index.add("");
        int n = 0;
        for (RatingDesk.QueueItem item : desk.queue(raterId)) {
            String id = item.blindId();
            if (!BlindIds.looksLikeId(id)) {
                // ids are ours, but a file name is only ever made from the checked shape
                throw new RatingException("the store holds a response id '" + id + "' that is not a blind id; nothing"
                        + " more was written");
            }
            RatingDesk.BlindResponse r = desk.response(raterId, id);
            String doc = "Response " + id + "\nTask: " + r.taskTitle() + " (" + r.taskId() + ")"
                    + switch (item.kind()) {
                        case ADJUDICATION -> "\nA further independent rating";
                        case QUALIFICATION -> "\nA qualification script: score it as any other; your live scripts"
                                + " follow once the qualification set is passed";
                        case RATING -> "";
                    }
                    + "\n\n" + r.text().replace("\r\n", "\n") + "\n";
            write(folder.resolve(id + ".txt"), doc);
            index.add(String.format("%4d  %s  %s%s", item.position(), id, r.taskId(), item.done() ? "  (rated)" : ""));
            n++;
        }
        write(folder.resolve("index.txt"), String.join("\n", index) + "\n");
        write(folder.resolve("rubric.txt"), rubricText(rubric));
        return new Written(folder, n);
    }

    /** The rubric's criteria with their score ranges and band descriptors, as a rater reads them. */
    public static String rubricText(ExamSource.Rubric rubric) {
        StringBuilder b = new StringBuilder("Rubric\n");
        for (ExamSource.Criterion c : rubric.criteria()) {
            b.append("\n").append(c.name()).append(" (").append(c.id()).append("): whole numbers ").append(c.minScore())
                    .append('-').append(c.maxScore()).append('\n');
            for (ExamSource.Band band : c.bands()) {
                b.append("  ").append(band.from()).append('-').append(band.to()).append(": ").append(band.descriptor())
                        .append('\n');
            }
        }
        return b.toString();
    }

    private static void write(Path file, String text) throws IOException {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        AtomicFiles.write(file, out -> out.write(bytes));
    }
}
