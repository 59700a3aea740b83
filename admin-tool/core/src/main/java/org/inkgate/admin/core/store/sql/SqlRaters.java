package org.inkgate.admin.core.store.sql;

import java.util.List;
import org.inkgate.admin.core.rating.RaterRegister;
import org.inkgate.admin.core.rating.RatingException;

/** {@link RaterRegister} in the results store (SQLite or PostgreSQL). */
final class SqlRaters implements RaterRegister {

    private static final String RATER_ID = "[A-Za-z0-9][A-Za-z0-9._-]{0,31}";

    private final RatingSession s;

    SqlRaters(RatingSession s) {
        this.s = s;
    }

    @Override
    public boolean addRater(String id, String label, Integer capacity) throws RatingException {
        if (id == null || !id.matches(RATER_ID)) {
            throw new RatingException("rater id '" + id + "' is not usable; use 1-32 letters, digits, '.', '_' or '-',"
                    + " starting with a letter or digit (e.g. R07)");
        }
        if (capacity != null && capacity < 0) {
            throw new RatingException("capacity " + capacity + " of rater " + id + " is negative; give 0 or more");
        }
        String name = label == null || label.isBlank() ? id : label.strip();
        return s.tx("adding rater " + id, () -> {
            boolean known = s.db.exists("SELECT 1 FROM raters WHERE rater_id=?", id);
            // INSERT ... ON CONFLICT DO UPDATE (upsert): the same words in SQLite 3.24+ and PostgreSQL 9.5+
            s.db.update("INSERT INTO raters(rater_id, label, capacity) VALUES (?,?,?) ON CONFLICT(rater_id) DO UPDATE"
                    + " SET label=excluded.label, capacity=excluded.capacity", id, name, capacity);
            return !known;
        });
    }

    @Override
    public List<RaterEntry> raterEntries() throws RatingException {
        return s.read("listing raters", s::raterEntries);
    }
}
