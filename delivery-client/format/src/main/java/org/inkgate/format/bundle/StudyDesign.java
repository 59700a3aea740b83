package org.inkgate.format.bundle;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.Optional;

/**
 * The study design an exam declares: how candidates, tasks and resource conditions are crossed.
 * Defined once here because it travels from the exam source (exam.yaml's {@code design.kind})
 * through the bundle manifest and the results store into the exports the analysis reads; each
 * constant's {@link #word()} is its name in all of them.
 */
public enum StudyDesign {
    /** Within candidates: tasks in a fixed order, condition orders from a Williams design (AB/BA for two). */
    @JsonProperty("crossover") CROSSOVER("crossover"),
    /** Within candidates: task orders from a Latin square, conditions by position. */
    @JsonProperty("latin-square") LATIN_SQUARE("latin-square"),
    /** Between candidates: each candidate sits every task under one condition (parallel groups). */
    @JsonProperty("parallel") PARALLEL("parallel");

    private final String word;

    StudyDesign(String word) {
        this.word = word;
    }

    /** The design's name in exam.yaml, the manifest, the store and the exports. */
    public String word() {
        return word;
    }

    /** True when every candidate sits one condition only. */
    public boolean betweenCandidates() {
        return this == PARALLEL;
    }

    public static Optional<StudyDesign> of(String word) {
        for (StudyDesign d : values()) {
            if (d.word.equals(word)) {
                return Optional.of(d);
            }
        }
        return Optional.empty();
    }
}
