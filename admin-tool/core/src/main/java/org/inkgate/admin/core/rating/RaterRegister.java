package org.inkgate.admin.core.rating;

import java.util.List;

/** The exam's raters as the test owner manages them: who may rate, and how much. */
public interface RaterRegister {

    /** A rater with the most responses they may take in this exam (null: no limit). */
    record RaterEntry(String id, String label, Integer capacity) {
    }

    /** Adds a rater, or changes the label and capacity of one already there; returns true when new. */
    boolean addRater(String id, String label, Integer capacity) throws RatingException;

    /** Every rater with label and capacity. */
    List<RaterEntry> raterEntries() throws RatingException;
}
