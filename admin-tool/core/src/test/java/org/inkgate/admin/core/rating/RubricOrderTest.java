package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The rubric's criteria keep the order of the exam source however often the rubric is registered
 * again: every `collect --exam` registers it, and the desk, sheets and reports show the criteria in
 * the order the store gives them.
 */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class RubricOrderTest {

    @Parameter
    StoreFixture.Kind kind;

    @TempDir
    Path dir;

    @Test
    void aRubricRegisteredAgainByManyCollects_keepsItsCriteriaInTheSourceOrder() throws Exception {
        StoreFixture store = InventedStore.make(kind, dir, 2, List.of("t1"));
        List<ExamSource.Criterion> criteria = new ArrayList<>();
        // twelve criteria whose ids do not sort in source order, so no key order can stand in for it
        for (String id : List.of("zeta", "alpha", "mu", "beta", "omega", "kappa", "delta", "pi", "gamma", "sigma", "eta", "iota")) {
            criteria.add(new ExamSource.Criterion(id, "Invented " + id, 0, 5, List.of()));
        }
        ExamSource.Rubric rubric = new ExamSource.Rubric("rubric.yaml", criteria);
        try (ResultsStore results = store.results()) {
            for (int collect = 0; collect < 60; collect++) {
                results.registerRubric(InventedStore.EXAM, rubric);
            }
        }
        try (RatingStore rating = store.rating(InventedStore.EXAM)) {
            List<String> stored = rating.rubric().criteria().stream().map(ExamSource.Criterion::id).toList();
            assertEquals(criteria.stream().map(ExamSource.Criterion::id).toList().subList(0, 12),
                    stored.stream().filter(id -> !id.equals("content") && !id.equals("language")).toList());
        }
    }
}
