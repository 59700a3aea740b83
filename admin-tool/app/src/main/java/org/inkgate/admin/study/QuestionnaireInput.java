package org.inkgate.admin.study;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.export.QuestionnaireCsv;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.analysis.data.QuestionnaireAnswer;
import org.inkgate.analysis.data.QuestionnaireData;
import org.inkgate.analysis.data.QuestionnaireItem;

/**
 * The analysis's questionnaire input, from the tidy questionnaire table ({@code analyse
 * --questionnaire FILE.csv}) or from a results store. Both go through the one reader of that table
 * ({@link QuestionnaireCsv}): the store's rows are written as the export writes them and read back, so
 * answers from a store meet exactly the checks a file meets (docs/analysis.md, "Questionnaire").
 */
public final class QuestionnaireInput {

    private QuestionnaireInput() {
    }

    /** Reads a questionnaire table; refused tables throw with every problem's row and column. */
    public static QuestionnaireData read(String file, Reader in) throws IOException, QuestionnaireCsv.Refused {
        return map(QuestionnaireCsv.read(file, in), file);
    }

    /** The exam's questionnaire answers in the store (empty when its forms ask no questionnaire). */
    public static QuestionnaireData read(ResultsStore store, String examId, String storeName)
            throws StoreException, IOException, QuestionnaireCsv.Refused {
        StringWriter csv = new StringWriter();
        long rows = QuestionnaireCsv.write(store, examId, csv);
        if (rows == 0) {
            return new QuestionnaireData(List.of(), List.of());
        }
        String name = storeName + " (questionnaire answers of " + examId + ")";
        return map(QuestionnaireCsv.read(name, new StringReader(csv.toString())), name);
    }

    /**
     * Items in the order first met, one answer per candidate and item: a candidate who answered one
     * item in two packages (a conflict the store keeps) is refused, because which package counts is
     * the test owner's decision.
     */
    static QuestionnaireData map(List<QuestionnaireCsv.Row> rows, String file) throws QuestionnaireCsv.Refused {
        Map<String, QuestionnaireItem> items = new LinkedHashMap<>();
        Map<String, String> packageOf = new LinkedHashMap<>();
        List<QuestionnaireAnswer> answers = new ArrayList<>();
        List<QuestionnaireCsv.Problem> problems = new ArrayList<>();
        int line = 1;
        for (QuestionnaireCsv.Row r : rows) {
            line++;
            String itemKey = r.questionnaireId() + '\u0000' + r.itemId();
            items.computeIfAbsent(itemKey, k -> new QuestionnaireItem(r.questionnaireId(), r.itemId(), r.itemText(),
                    kind(r.kind()), r.labels()));
            String earlier = packageOf.putIfAbsent(r.candidateNumber() + '\u0000' + itemKey, r.packageId());
            if (earlier != null) {
                problems.add(new QuestionnaireCsv.Problem(file, line, "package_id", "candidate "
                        + QuestionnaireCsv.shown(r.candidateNumber()) + " has two answers to item "
                        + QuestionnaireCsv.shown(r.itemId()) + " of " + QuestionnaireCsv.shown(r.questionnaireId())
                        + " (packages " + QuestionnaireCsv.shown(earlier) + " and " + QuestionnaireCsv.shown(r.packageId())
                        + "): decide which package counts (column copies of responses.csv),"
                        + " then give --questionnaire with that package's rows only"));
                continue;
            }
            answers.add(new QuestionnaireAnswer(r.candidateNumber(), r.level(), r.conditions(), r.questionnaireId(),
                    r.itemId(), r.answer()));
        }
        if (!problems.isEmpty()) {
            throw new QuestionnaireCsv.Refused(problems);
        }
        return new QuestionnaireData(List.copyOf(items.values()), answers);
    }

    private static QuestionnaireItem.Kind kind(String wireName) {
        return QuestionnaireCsv.kindOf(wireName).map(k -> switch (k) {
            case LIKERT -> QuestionnaireItem.Kind.LIKERT;
            case FREE_TEXT -> QuestionnaireItem.Kind.FREE_TEXT;
        }).orElse(QuestionnaireItem.Kind.UNDEFINED);
    }
}
