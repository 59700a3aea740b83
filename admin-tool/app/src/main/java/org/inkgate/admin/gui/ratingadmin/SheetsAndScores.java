package org.inkgate.admin.gui.ratingadmin;

import java.nio.file.Path;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.rating.RatingFiles;
import org.inkgate.admin.gui.Fields;

/**
 * Rating sheets out and in, and the ratings and final scores, as {@code rate sheet export},
 * {@code rate sheet import} and {@code rate export}: the same files and lines through {@link RatingFiles}.
 */
public final class SheetsAndScores {

    private final RatingAdminModel model;
    private final StringProperty rater = new SimpleStringProperty("");
    private final StringProperty sheet = new SimpleStringProperty("");
    private final StringProperty scoresFolder = new SimpleStringProperty("");

    SheetsAndScores(RatingAdminModel model) {
        this.model = model;
    }

    /** Whose sheet. */
    public StringProperty rater() { return rater; }
    /** The sheet file (CSV) to write or read. */
    public StringProperty sheet() { return sheet; }
    /** Where ratings.csv and final-scores.csv go. */
    public StringProperty scoresFolder() { return scoresFolder; }

    public void exportSheet() {
        Path file = Fields.path(sheet.get());
        String id = rater.get().strip();
        if (file == null || id.isEmpty()) {
            model.message().set("Name the rater and the sheet file to write.");
            return;
        }
        model.call("Writing the sheet of " + id, s -> String.join("\n", RatingFiles.exportSheet(s, id, file)));
    }

    public void importSheet() {
        Path file = Fields.path(sheet.get());
        String id = rater.get().strip();
        if (file == null || id.isEmpty()) {
            model.message().set("Name the rater and the filled sheet to read.");
            return;
        }
        model.call("Reading the sheet of " + id, s -> RatingFiles.importSheet(s, id, file));
    }

    public void exportScores() {
        Path dir = Fields.path(scoresFolder.get());
        if (dir == null) {
            model.message().set("Name the folder for ratings.csv and final-scores.csv.");
            return;
        }
        model.call("Writing ratings and final scores", s -> String.join("\n", RatingFiles.exportScores(s, dir)));
    }
}
