package org.inkgate.admin.gui.ratingadmin;

import java.security.SecureRandom;
import java.util.List;
import java.util.Locale;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.rating.ControlMonitor;
import org.inkgate.admin.core.rating.ControlScripts;

/**
 * Control scripts and the per-rater monitor of the rating step, as {@code rate control mark},
 * {@code rate control mix}, {@code rate control list} and {@code rate monitor}: the same
 * control scripts of the rating store and {@link ControlMonitor}. The store is read after every action;
 * the monitor is worked out again from those ratings whenever the limits change.
 */
public final class ControlQuality {

    private final RatingAdminModel model;
    private final AgreedScriptForm form = new AgreedScriptForm();
    private final ObservableList<ControlScripts.Control> controls = FXCollections.observableArrayList();
    private final ObservableList<ControlMonitor.RaterReport> monitor = FXCollections.observableArrayList();
    private List<ControlScripts.ControlRating> ratings = List.of();
    private final StringProperty mixSeed = new SimpleStringProperty("");
    private final StringProperty minExact = new SimpleStringProperty("");
    private final StringProperty minAdjacent = new SimpleStringProperty(
            text(ControlMonitor.Thresholds.PLACEHOLDER_MIN_ADJACENT));
    private final StringProperty maxMeanDifference = new SimpleStringProperty(
            text(ControlMonitor.Thresholds.PLACEHOLDER_MAX_MEAN_DIFFERENCE));
    private final StringProperty maxDrift = new SimpleStringProperty(text(ControlMonitor.Thresholds.PLACEHOLDER_MAX_DRIFT));

    ControlQuality(RatingAdminModel model) {
        this.model = model;
    }

    public ObservableList<ControlScripts.Control> controls() { return controls; }
    /** One row per rater who rated a control script, from {@link ControlMonitor#of}. */
    public ObservableList<ControlMonitor.RaterReport> monitor() { return monitor; }
    public StringProperty candidate() { return form.candidate(); }
    public StringProperty task() { return form.task(); }
    /** CRITERION=SCORE pairs separated by commas, as the command's --agreed. */
    public StringProperty agreed() { return form.agreed(); }
    public StringProperty source() { return form.source(); }
    /** Blank: a new seed is drawn, shown here and in the message. */
    public StringProperty mixSeed() { return mixSeed; }
    /** Blank: not checked. */
    public StringProperty minExact() { return minExact; }
    public StringProperty minAdjacent() { return minAdjacent; }
    public StringProperty maxMeanDifference() { return maxMeanDifference; }
    public StringProperty maxDrift() { return maxDrift; }

    /** As {@code rate control mark --candidate N --task ID --agreed ... --source TEXT}. */
    public void mark() {
        form.mark(model, "control script", (s, who, which, scores, from) -> {
            s.markControl(who, which, scores, from);
            return "Marked: candidate " + who + ", task " + which + ". Put it into the queues with Mix into queues.";
        });
    }

    /** As {@code rate control mix --seed N}; a blank seed is drawn and shown first. */
    public void mix() {
        long seed;
        try {
            if (mixSeed.get().isBlank()) {
                mixSeed.set(Long.toString(new SecureRandom().nextLong()));
            }
            seed = Long.parseLong(mixSeed.get().strip());
        } catch (NumberFormatException e) {
            model.message().set("The mixing seed must be a whole number (blank: a new one is drawn).");
            return;
        }
        model.call("Mixing control scripts into the queues", s -> {
            int added = s.mixControls(seed);
            return added + " control item(s) added to raters' queues (seed " + seed + ").";
        });
    }

    /** Works the monitor out again from the ratings last read, under the limits as typed now. */
    public void applyLimits() {
        try {
            monitor.setAll(ControlMonitor.of(ratings, thresholds()));
        } catch (IllegalArgumentException e) {
            model.message().set("The monitor limits were not applied: " + e.getMessage());
        }
    }

    /** The limits as typed; blank fields are not checked. */
    ControlMonitor.Thresholds thresholds() {
        return new ControlMonitor.Thresholds(number(minExact, "Minimum exact agreement"),
                number(minAdjacent, "Minimum adjacent agreement"), number(maxMeanDifference, "Largest mean difference"),
                number(maxDrift, "Largest drift"));
    }

    /** Called on the JavaFX thread with what the store holds now. */
    void show(List<ControlScripts.Control> now, List<ControlScripts.ControlRating> rated) {
        controls.setAll(now);
        ratings = List.copyOf(rated);
        applyLimits();
    }

    /** A limit typed in a field; blank: null (not checked). */
    static Double number(StringProperty field, String name) {
        String t = field.get() == null ? "" : field.get().strip();
        if (t.isEmpty()) {
            return null;
        }
        try {
            return Double.valueOf(t);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(name + " \"" + t + "\" is not a number (e.g. 0.8); leave it blank"
                    + " for no such check.", e);
        }
    }

    private static String text(double d) {
        return String.format(Locale.ROOT, "%.1f", d);
    }
}
