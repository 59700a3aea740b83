package org.inkgate.admin.gui.ratingadmin;

import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.rating.Referrals;

/**
 * Scripts raters referred to the test owner, listed and decided as {@code rate referrals list} and
 * {@code rate referrals decide} do, through the store's {@link Referrals}. A decision changes no
 * score and no queue: what follows for the candidate is for the exam's regulations.
 */
public final class ReferralDecisions {

    private final RatingAdminModel model;
    private final ObservableList<Referrals.Referral> referrals = FXCollections.observableArrayList();
    private final StringProperty referral = new SimpleStringProperty("");
    private final StringProperty by = new SimpleStringProperty("");
    private final StringProperty decision = new SimpleStringProperty("");

    ReferralDecisions(RatingAdminModel model) {
        this.model = model;
    }

    /** Every referral of the exam, oldest first, with the candidate number (the test owner's view). */
    public ObservableList<Referrals.Referral> referrals() { return referrals; }
    /** The referral number to decide, from the list. */
    public StringProperty referral() { return referral; }
    public StringProperty by() { return by; }
    public StringProperty decision() { return decision; }

    /** As {@code rate referrals decide --referral N --by NAME --decision TEXT}. */
    public void decide() {
        long id;
        try {
            id = Long.parseLong(referral.get().strip());
        } catch (NumberFormatException e) {
            model.message().set("Give the referral number (a whole number from the Referral column).");
            return;
        }
        String who = by.get().strip();
        String what = decision.get().strip();
        if (who.isEmpty() || what.isEmpty()) {
            model.message().set("Name who decided and write the decision; nothing was recorded.");
            return;
        }
        model.call("Recording the decision on referral " + id, s -> {
            s.decide(id, who, what);
            return "Referral " + id + " decided.";
        });
    }
}
