package org.inkgate.admin.gui.ratingadmin;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.List;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.rating.AssignmentSummary;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.QualificationSet;
import org.inkgate.admin.core.rating.QualificationStanding;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.StoreField;
import org.inkgate.admin.core.store.StoreException;

/**
 * The rating administration step: raters, the seeded assignment and its linkage, progress per
 * rater and task, over the same {@link RatingStore} calls as {@code inkgate-admin rate}.
 * Every call runs on the session's background worker; the tables are read again after each.
 */
public final class RatingAdminModel {

    /** What the tables show, read in one go after each change. */
    record Snapshot(List<RatingStore.RaterEntry> raters, List<RatingStore.ProgressRow> progress,
            List<RatingStore.Flag> flags, String state, List<Referrals.Referral> referrals,
            List<ControlScripts.Control> controls, List<ControlScripts.ControlRating> controlRatings,
            List<QualificationSet.Script> qualification, List<QualificationStanding> standings, String qualificationRule) {
    }

    /** One store call; returns the message for the test owner. */
    interface Call {
        String run(RatingStore s) throws Exception;
    }

    /** Opening the store, the action, reading the tables again. */
    private static final int STAGES = 3;

    private final AdminSession session;
    private final StringProperty store = new SimpleStringProperty("");
    private final StringProperty exam = new SimpleStringProperty("");
    private final StringProperty raterId = new SimpleStringProperty("");
    private final StringProperty raterLabel = new SimpleStringProperty("");
    private final StringProperty capacity = new SimpleStringProperty("");
    private final StringProperty ratersPerResponse = new SimpleStringProperty("2");
    private final StringProperty seed = new SimpleStringProperty("");
    private final BooleanProperty allowUnlinked = new SimpleBooleanProperty(false);
    private final StringProperty message = new SimpleStringProperty("");
    private final StringProperty state = new SimpleStringProperty("");
    private final ObservableList<RatingStore.RaterEntry> raters = FXCollections.observableArrayList();
    private final ObservableList<RatingStore.ProgressRow> progress = FXCollections.observableArrayList();
    private final ObservableList<RatingStore.Flag> flags = FXCollections.observableArrayList();
    private final RuleAndFlags rule = new RuleAndFlags(this);
    private final SheetsAndScores sheets = new SheetsAndScores(this);
    private final ReferralDecisions referrals = new ReferralDecisions(this);
    private final ControlQuality controls = new ControlQuality(this);
    private final QualificationQuality qualification = new QualificationQuality(this);

    public RatingAdminModel(AdminSession session) {
        this.session = session;
        StoreField.link(store, session.store());
    }

    public StringProperty store() { return store; }

    /** The password file of a PostgreSQL store, shared by the steps. */
    public StringProperty storePasswordFile() { return session.storePasswordFile(); }
    public StringProperty exam() { return exam; }
    public StringProperty raterId() { return raterId; }
    public StringProperty raterLabel() { return raterLabel; }
    public StringProperty capacity() { return capacity; }
    public StringProperty ratersPerResponse() { return ratersPerResponse; }
    /** Blank: a new seed is drawn, shown here and recorded in the store. */
    public StringProperty seed() { return seed; }
    public BooleanProperty allowUnlinked() { return allowUnlinked; }
    /** The outcome of the last action, or why it was refused. */
    public StringProperty message() { return message; }
    /** Linkage of the design so far, responses without a final score, the rule in force. */
    public StringProperty state() { return state; }
    public ObservableList<RatingStore.RaterEntry> raters() { return raters; }
    public ObservableList<RatingStore.ProgressRow> progress() { return progress; }
    public ObservableList<RatingStore.Flag> flags() { return flags; }
    public RuleAndFlags rule() { return rule; }
    public SheetsAndScores sheets() { return sheets; }
    public ReferralDecisions referrals() { return referrals; }
    public ControlQuality controls() { return controls; }
    public QualificationQuality qualification() { return qualification; }

    /** Reads raters, progress and flags again. */
    public void refresh() {
        call("Reading the ratings", s -> "");
    }

    /** As {@code rate raters add ID --label NAME --capacity N}. */
    public void addRater() {
        String id = raterId.get().strip();
        Integer cap;
        try {
            cap = capacity.get().isBlank() ? null : Integer.valueOf(capacity.get().strip());
        } catch (NumberFormatException e) {
            message.set("Capacity \"" + capacity.get().strip() + "\" is not a whole number; leave it blank for no limit.");
            return;
        }
        String label = raterLabel.get().isBlank() ? null : raterLabel.get().strip();
        call("Adding rater " + id, s -> (s.addRater(id, label, cap) ? "Added rater " : "Updated rater ") + id
                + (cap == null ? " (no capacity limit)" : " (capacity " + cap + ")"));
    }

    /** As {@code rate assign --raters-per-response K --seed N}; a blank seed is drawn and shown first. */
    public void assign() {
        int k;
        long used;
        try {
            k = Integer.parseInt(ratersPerResponse.get().strip());
            if (seed.get().isBlank()) {
                seed.set(Long.toString(new SecureRandom().nextLong()));
            }
            used = Long.parseLong(seed.get().strip());
        } catch (NumberFormatException e) {
            message.set("The seed and raters per response must be whole numbers (seed blank: a new one is drawn).");
            return;
        }
        boolean unlinked = allowUnlinked.get();
        call("Assigning responses", s -> String.join("\n", AssignmentSummary.lines(s.assign(k, used, unlinked))));
    }

    /** Runs {@code call} on the worker over the named store, then shows its message and the tables. */
    void call(String what, Call call) {
        StoreLocation file;
        try {
            file = StoreField.existing(store.get(), session.storePasswordFile().get());
        } catch (StoreException e) {
            message.set(e.getMessage());
            return;
        }
        String examId = exam.get().isBlank() ? null : exam.get().strip();
        session.work().run(what, p -> {
            // one store transaction each, too short to cancel: the bar counts its three stages instead of spinning
            p.update(0, STAGES, what + ": opening the store");
            try (RatingStore s = open(file, examId)) {
                p.update(1, STAGES, what);
                String said = call.run(s);
                p.update(2, STAGES, what + ": reading raters, progress, flags and quality tables");
                return new Object[] {said, snapshot(s)};
            }
        }, done -> {
            message.set((String) done[0]);
            show((Snapshot) done[1]);
        }, problem -> message.set("Refused, nothing changed: " + problem));
    }

    private void show(Snapshot s) {
        raters.setAll(s.raters());
        progress.setAll(s.progress());
        flags.setAll(s.flags());
        state.set(s.state());
        referrals.referrals().setAll(s.referrals());
        controls.show(s.controls(), s.controlRatings());
        qualification.show(s.qualification(), s.standings(), s.qualificationRule());
    }

    /** As the command's --exam: may be left out when the store holds one exam. */
    static RatingStore open(StoreLocation file, String examId) throws RatingException {
        String id = examId;
        if (id == null) {
            List<String> exams = Stores.exams(file);
            if (exams.size() != 1) {
                throw new RatingException("the store holds " + exams.size() + " exams " + exams + "; name one in Exam id");
            }
            id = exams.get(0);
        }
        return Stores.openRating(file, id);
    }

    private static Snapshot snapshot(RatingStore s) throws RatingException {
        List<String> state = new ArrayList<>();
        state.add(AssignmentSummary.linkage(s.design()));
        int pending = s.pendingResponses();
        state.add(pending == 0 ? "Every assigned response has a final score." : pending
                + " response(s) have no final score yet (ratings outstanding or disagreements not settled).");
        state.add(s.rule().map(r -> "Discrepancy rule: flag " + r.describe() + ".")
                .orElse("No discrepancy rule is set: ratings are averaged without any check."));
        return new Snapshot(s.raterEntries(), s.progressRows(), s.flags(), String.join("\n", state), s.referrals(false),
                s.controls(), s.controlRatings(), s.qualificationScripts(), s.qualificationStandings(),
                s.qualificationRule().map(r -> "Qualification rule: " + r.describe() + ".")
                        .orElse("No qualification rule is set: live rating is open to every rater."));
    }
}
