package org.inkgate.admin.study;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingExport;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.analysis.data.InputRejected;
import org.inkgate.analysis.data.Rating;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.analysis.data.RatingsReader;

/**
 * The analysis's ratings read from a results store: the store's tidy ratings export passed through
 * the analysis's own {@link RatingsReader}, so ratings from the store meet exactly the checks a
 * ratings CSV meets. Every current rating is included, first ratings and adjudicators' alike
 * (docs/analysis.md, "Input from a results store").
 */
public final class StoreRatings {

    private StoreRatings() {
    }

    /** Every current rating of the exam, as the analysis reads them (empty when nothing is rated yet). */
    public static List<Rating> read(Path storeFile, String examId) throws RatingException, IOException, InputRejected {
        return read(StoreLocation.file(storeFile), examId);
    }

    /** As {@link #read(Path, String)} from a store at any location (a file or a PostgreSQL server). */
    public static List<Rating> read(StoreLocation store, String examId) throws RatingException, IOException,
            InputRejected {
        StringWriter csv = new StringWriter();
        long rows;
        try (RatingStore s = Stores.openRating(store, examId)) {
            rows = RatingExport.ratings(s, csv);
        }
        if (rows == 0) {
            return List.of(); // the reader refuses a table with no rows; the caller says why in its own words
        }
        return RatingsReader.read(AnalysisRun.storeName(store) + " (ratings of " + examId + ")",
                new StringReader(csv.toString()));
    }
}
