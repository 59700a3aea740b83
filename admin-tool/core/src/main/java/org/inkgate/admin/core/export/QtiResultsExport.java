package org.inkgate.admin.core.export;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.inkgate.admin.core.qti.QtiIdentifier;
import org.inkgate.admin.core.qti.XmlOut;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.ResponseScores;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.StoreException;

/**
 * QTI 3.0 Results Reporting (namespace {@value #NAMESPACE}, schema {@code imsqti_resultv3p0_v1p0.xsd}):
 * one {@code assessmentResult} per response package. Every identifier is made by {@link QtiIdentifier}
 * (the schema types them as NCName); the original ids are kept as string context variables of the
 * test result. Each task is an {@code itemResult} holding the final text and, once ratings exist,
 * the scores as outcome variables: the final score and each criterion's final score (when decided),
 * and every rater's current rating per criterion, each with the rubric's range. Field by field in
 * docs/data-dictionary.md, "qti-results".
 */
public final class QtiResultsExport {

    public static final String NAMESPACE = "http://www.imsglobal.org/xsd/imsqti_result_v3p0";
    /** The {@code sessionIdentifier@sourceID} naming Inkgate's response packages. */
    public static final String PACKAGE_SOURCE = "urn:inkgate:response-package";

    /**
     * Ratings to report with the responses: the rubric (criterion names and ranges) and the scores by
     * response. {@link #NONE} before any rating.
     */
    public record Scoring(ExamSource.Rubric rubric, Map<ResponseScores.Key, ResponseScores> scores) {
        public static final Scoring NONE = new Scoring(new ExamSource.Rubric("", List.of()), Map.of());

        public Scoring {
            scores = Map.copyOf(scores);
        }
    }

    /**
     * What one export wrote.
     *
     * @param files      files written
     * @param scored     item results that carry a final score
     * @param replaced   characters XML 1.0 forbids, written as U+FFFD (the tidy CSV keeps them)
     */
    public record Written(int files, int scored, long replaced) {
    }

    private QtiResultsExport() {
    }

    /** Writes one file per response package into {@code folder}, without scores. */
    public static Written write(ResultsStore store, String examId, Path folder) throws IOException, StoreException {
        return write(store, examId, folder, Scoring.NONE);
    }

    /**
     * Writes one file per response package into {@code folder}: {@code <candidate>.xml}, or
     * {@code <candidate>-<package>.xml} for a candidate with more than one package, both parts as
     * QTI identifiers. A name that would leave the folder is refused before anything is written.
     */
    public static Written write(ResultsStore store, String examId, Path folder, Scoring scoring)
            throws IOException, StoreException {
        Map<Long, List<Rows.Response>> bySitting = new LinkedHashMap<>();
        store.forEachResponse(examId, r -> bySitting.computeIfAbsent(r.sittingId(), k -> new ArrayList<>()).add(r));
        Map<String, Integer> perCandidate = new LinkedHashMap<>();
        bySitting.values().forEach(rs -> perCandidate.merge(rs.get(0).candidateNumber(), 1, Integer::sum));
        Map<Path, List<Rows.Response>> files = new LinkedHashMap<>();
        Set<String> used = new HashSet<>();
        for (List<Rows.Response> rows : bySitting.values()) {
            Rows.Response first = rows.get(0);
            String candidate = QtiIdentifier.encode(first.candidateNumber());
            String name = candidate + ".xml";
            // one package per candidate is the rule; a second package, or a name that differs only in case
            // (which would overwrite on case-insensitive file systems), gets the package id added
            if (perCandidate.get(first.candidateNumber()) > 1 || used.contains(name.toLowerCase(Locale.ROOT))) {
                name = candidate + "-" + QtiIdentifier.encode(first.packageId()) + ".xml";
            }
            used.add(name.toLowerCase(Locale.ROOT));
            files.put(OutputFolder.file(folder, name), rows);
        }
        Files.createDirectories(folder);
        int scored = 0;
        long replaced = 0;
        for (var file : files.entrySet()) {
            try (Writer w = Files.newBufferedWriter(file.getKey(), StandardCharsets.UTF_8); XmlOut x = new XmlOut(w)) {
                scored += write(file.getValue(), scoring, x);
                replaced += x.replaced();
            }
        }
        return new Written(files.size(), scored, replaced);
    }

    /** Writes one assessmentResult; returns how many item results carry a final score. */
    static int write(List<Rows.Response> rows, Scoring scoring, XmlOut x) throws IOException {
        Rows.Response first = rows.get(0);
        x.start("assessmentResult").attribute("xmlns", NAMESPACE);
        x.start("context").attribute("sourcedId", QtiIdentifier.encode(first.candidateNumber()));
        x.start("sessionIdentifier").attribute("sourceID", PACKAGE_SOURCE)
                .attribute("identifier", QtiIdentifier.encode(first.packageId())).end();
        x.end();
        x.start("testResult").attribute("identifier", QtiIdentifier.encode(first.examId()))
                .attribute("datestamp", firstTime(first.submittedAt(), first.endedAt(), first.startedAt()));
        contextVariable(x, "CANDIDATE_NUMBER", first.candidateNumber());
        contextVariable(x, "EXAM_ID", first.examId());
        contextVariable(x, "FORM_ID", first.formId());
        contextVariable(x, "PACKAGE_ID", first.packageId());
        x.end();
        int scored = 0;
        for (Rows.Response r : rows) {
            x.start("itemResult").attribute("identifier", QtiIdentifier.encode(r.taskId()))
                    .attribute("sequenceIndex", String.valueOf(r.position() + 1))
                    .attribute("datestamp", firstTime(r.endedAt(), r.startedAt(), first.submittedAt()))
                    .attribute("sessionStatus", "final");
            x.start("responseVariable").attribute("identifier", "RESPONSE").attribute("cardinality", "single")
                    .attribute("baseType", "string");
            x.start("candidateResponse");
            x.element("value", r.text() == null ? "" : r.text());
            x.end();
            x.end();
            ResponseScores scores = scoring.scores().get(new ResponseScores.Key(r.sittingId(), r.taskId()));
            if (scores != null) {
                scored += outcomes(x, scoring.rubric(), scores) ? 1 : 0;
            }
            x.end();
        }
        x.end();
        return scored;
    }

    private static boolean outcomes(XmlOut x, ExamSource.Rubric rubric, ResponseScores scores) throws IOException {
        boolean decided = !scores.finalScores().isEmpty();
        if (decided) {
            double total = 0;
            int min = 0;
            int max = 0;
            for (ExamSource.Criterion c : rubric.criteria()) {
                Double s = scores.finalScores().get(c.id());
                if (s == null) {
                    throw new IOException("the final score of a response lacks criterion " + c.id()
                            + "; run rate flags to see the response and settle it before exporting");
                }
                total += s;
                min += c.minScore();
                max += c.maxScore();
            }
            outcome(x, "SCORE", "float", number(total), "final score: sum of the criterion scores ("
                    + scores.method() + ")", min, max);
            for (ExamSource.Criterion c : rubric.criteria()) {
                outcome(x, criterionIdentifier("SCORE_", c.id()), "float", number(scores.finalScores().get(c.id())),
                        c.name() + ": final score (" + scores.method() + ")", c.minScore(), c.maxScore());
            }
        }
        for (ResponseScores.Rating rating : scores.ratings()) {
            String rater = rating.raterId();
            if (rater.contains("_") || !QtiIdentifier.isIdentifier("R" + rater)) {
                throw new IOException("rater id " + OutputFolder.printable(rater) + " cannot be part of a QTI identifier");
            }
            String kind = rating.kind() == RatingDesk.Kind.ADJUDICATION ? "adjudication" : "rating";
            for (ExamSource.Criterion c : rubric.criteria()) {
                Integer s = rating.scores().get(c.id());
                if (s != null) {
                    outcome(x, criterionIdentifier("RATING_" + rater + "_", c.id()), "integer", String.valueOf(s),
                            c.name() + ": " + kind + " by rater " + rater, c.minScore(), c.maxScore());
                }
            }
        }
        return decided;
    }

    private static String criterionIdentifier(String prefix, String criterionId) throws IOException {
        String id = prefix + criterionId;
        if (!QtiIdentifier.isIdentifier(id)) {
            throw new IOException("criterion id " + OutputFolder.printable(criterionId)
                    + " cannot be part of a QTI identifier; criterion ids hold letters, digits, '.', '-' and '_'");
        }
        return id;
    }

    private static void outcome(XmlOut x, String identifier, String baseType, String value, String interpretation,
            int min, int max) throws IOException {
        x.start("outcomeVariable").attribute("identifier", identifier).attribute("cardinality", "single")
                .attribute("baseType", baseType).attribute("view", "scorer").attribute("interpretation", interpretation)
                .attribute("normalMaximum", String.valueOf(max)).attribute("normalMinimum", String.valueOf(min))
                .attribute("external-scored", "human");
        x.element("value", value);
        x.end();
    }

    private static void contextVariable(XmlOut x, String identifier, String value) throws IOException {
        x.start("contextVariable").attribute("identifier", identifier).attribute("cardinality", "single")
                .attribute("baseType", "string");
        x.element("value", value);
        x.end();
    }

    private static String firstTime(String... times) throws IOException {
        for (String t : times) {
            if (t != null && !t.isEmpty()) {
                return t;
            }
        }
        throw new IOException("a response in the store has no start, end or submission time; collect it again");
    }

    /** xs:double's lexical form for a score: whole numbers without a point, at most six decimals. */
    static String number(double v) {
        if (v == Math.rint(v)) {
            return String.valueOf((long) v);
        }
        return BigDecimal.valueOf(v).setScale(6, java.math.RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString();
    }
}
