package org.inkgate.admin.core.collection;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.CandidateNumber;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.WordCount;

/**
 * Rules a package's content must keep even when its signature is good: a trusted installation can
 * still run a faulty client, and {@code collect --any-installation} takes packages anyone holding
 * the owner's public key can write. Each breach names the rule and where; the collector refuses the
 * package on the first one (docs/formats.md, "What collect refuses").
 */
final class PackageContentRules {

    /** One broken rule: a short reason code (as stored with the refusal) and what is wrong, for people. */
    record Breach(String reason, String message) {
    }

    private PackageContentRules() {
    }

    /** The rules that hold whatever bundle the package names. */
    static List<Breach> beforeBundle(ResponseDocument d) {
        List<Breach> breaches = new ArrayList<>();
        if (!CandidateNumber.isValid(d.candidateNumber())) {
            breaches.add(new Breach("candidate-number", "its candidate number \""
                    + FormatRefusal.printable(shorten(d.candidateNumber())) + "\" breaks the rule for candidate numbers ("
                    + CandidateNumber.RULE + "), which every roster and client keeps"));
        }
        return breaches;
    }

    /** What the refusal says of a NUL character, after where it is. */
    static final String NUL_WORDS = " holds a NUL character (U+0000), which no client of this version writes, a PostgreSQL"
            + " store cannot hold (PostgreSQL docs, \"Character Types\") and exports would mishandle";

    /**
     * The texts of the package the store keeps as text, with where each is, checked for U+0000:
     * refused rather than changed, so that both kinds of store hold the same and a candidate's text
     * is never altered on the way. Event data are kept as JSON, where U+0000 is written
     * {@code \\u0000} (backslash, u, four zeros), so a NUL there is stored, reversibly, and not refused.
     */
    static List<Breach> nulCharacters(ResponseDocument d, List<ProcessEvent> events,
            org.inkgate.format.response.EventLines lines) {
        List<Breach> breaches = new ArrayList<>();
        java.util.function.BiConsumer<String, String> check = (where, text) -> {
            if (text != null && text.indexOf(0) >= 0) {
                breaches.add(new Breach("nul-character", where + NUL_WORDS));
            }
        };
        check.accept("the package id", d.packageId());
        check.accept("the exam id", d.examId());
        check.accept("the form id", d.formId());
        check.accept("the seat", d.seat());
        check.accept("the client version", d.clientVersion());
        for (TaskResponse t : d.tasks()) {
            String task = FormatRefusal.printable(shorten(t.taskId()));
            check.accept("the id of task " + task, t.taskId());
            check.accept("the condition of task " + task, t.conditionId());
            check.accept("the text of task " + task, t.text());
        }
        for (QuestionnaireAnswers q : d.questionnaires()) {
            String questionnaire = FormatRefusal.printable(shorten(q.questionnaireId()));
            check.accept("the id of questionnaire " + questionnaire, q.questionnaireId());
            for (Map.Entry<String, String> a : q.answers().entrySet()) {
                String item = FormatRefusal.printable(shorten(a.getKey()));
                check.accept("the item id " + item + " of questionnaire " + questionnaire, a.getKey());
                check.accept("the answer to item " + item + " of questionnaire " + questionnaire, a.getValue());
            }
        }
        // where is named only for a breach: building it for every event cost the single storing thread a
        // tenth of its Java time (collect profile, docs/benchmarks.md, issue 16)
        // a plain line has no escape and no raw control character (EventLines), so no U+0000: only the others are read
        for (int i : lines.others()) {
            ProcessEvent e = events.get(i);
            if (e.type().indexOf(0) >= 0) {
                check.accept("the type of event " + e.seq(), e.type());
            }
            if (e.task() != null && e.task().indexOf(0) >= 0) {
                check.accept("the task of event " + e.seq(), e.task());
            }
        }
        return breaches;
    }

    /**
     * How far a task's word count may be from the count of its text before the package is refused:
     * more than 5 words and more than a tenth of the text. The client counts with the same rule
     * ({@link WordCount}), so a client of this version agrees exactly; the margin covers a client
     * whose rule differed on edge cases (hyphens, digits, a newer Unicode's letters), while a count
     * far from the text (a faulty or forged client) is caught.
     */
    static boolean wordCountFar(int reported, int counted) {
        int gap = Math.abs(reported - counted);
        return gap > 5 && gap * 10 > counted;
    }

    /** The rules that compare the package's content with itself and with its form in the bundle. */
    static List<Breach> withBundle(BundleManifest bundle, ResponseDocument d) {
        List<Breach> breaches = new ArrayList<>();
        if (d.startedAt() != null && d.submittedAt() != null && d.submittedAt().isBefore(d.startedAt())) {
            breaches.add(new Breach("time-order", "it was submitted (" + d.submittedAt() + ") before it started ("
                    + d.startedAt() + ")"));
        }
        for (TaskResponse t : d.tasks()) {
            String task = "task " + FormatRefusal.printable(shorten(t.taskId()));
            if (t.wordCount() < 0) {
                breaches.add(new Breach("negative-count", task + " has a negative word count (" + t.wordCount() + ")"));
            } else {
                int counted = WordCount.of(t.text());
                if (wordCountFar(t.wordCount(), counted)) {
                    breaches.add(new Breach("word-count", task + " reports " + t.wordCount() + " words but its text has "
                            + counted + " (tolerance: 5 words or a tenth of the text, whichever is more)"));
                }
            }
            if (t.extraTimeSeconds() < 0) {
                breaches.add(new Breach("negative-time", task + " has negative extra time (" + t.extraTimeSeconds()
                        + " s)"));
            }
            if (t.startedAt() != null && t.endedAt() != null && t.endedAt().isBefore(t.startedAt())) {
                breaches.add(new Breach("time-order", task + " ended (" + t.endedAt() + ") before it started ("
                        + t.startedAt() + ")"));
            }
        }
        FormSpec form = bundle.form(d.formId()).orElse(null);
        Set<String> asked = new HashSet<>();
        if (form != null) {
            for (String q : java.util.Arrays.asList(form.preQuestionnaire(), form.postQuestionnaire())) {
                if (q != null) {
                    asked.add(q);
                }
            }
        }
        for (QuestionnaireAnswers a : d.questionnaires()) {
            String q = FormatRefusal.printable(shorten(a.questionnaireId()));
            QuestionnaireSpec spec = bundle.questionnaire(a.questionnaireId()).orElse(null);
            if (spec == null || !asked.contains(a.questionnaireId())) {
                breaches.add(new Breach("questionnaire", "it answers questionnaire " + q + ", which its form does not ask"));
                continue;
            }
            for (Map.Entry<String, String> answer : a.answers().entrySet()) {
                String item = q + " item " + FormatRefusal.printable(shorten(answer.getKey()));
                QuestionItem question = spec.items().stream().filter(i -> i.id().equals(answer.getKey())).findFirst()
                        .orElse(null);
                if (question == null) {
                    breaches.add(new Breach("questionnaire", "it answers " + item + ", which the questionnaire does not have"));
                } else if (question.kind() == QuestionItem.Kind.LIKERT && !onScale(answer.getValue(), question.labels().size())) {
                    breaches.add(new Breach("questionnaire", "its answer to " + item + " is \""
                            + FormatRefusal.printable(shorten(answer.getValue())) + "\", not a point of the scale 1-"
                            + question.labels().size()));
                }
            }
        }
        return breaches;
    }

    /** A Likert answer: empty (not answered) or a whole number from 1 to the number of labels. */
    private static boolean onScale(String value, int points) {
        if (value == null || value.isEmpty()) {
            return true;
        }
        if (!value.matches("[0-9]{1,3}")) {
            return false;
        }
        int v = Integer.parseInt(value);
        return v >= 1 && v <= points;
    }

    static String shorten(String s) {
        return s == null ? "" : s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }
}
