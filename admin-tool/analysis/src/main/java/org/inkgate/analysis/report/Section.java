package org.inkgate.analysis.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One section of the report (e.g. descriptives, raters, or a later many-facet Rasch section):
 * paragraphs, tables, charts, and the figures it contributes to summary.json under its own key
 * prefix. Sections are independent, so a new analysis adds a section without touching others.
 */
public record Section(String id, String title, List<String> paragraphs, List<Table> tables, List<Chart> charts,
        Map<String, Object> summary) {

    public Section {
        paragraphs = List.copyOf(paragraphs);
        tables = List.copyOf(tables);
        charts = List.copyOf(charts);
        summary = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(summary));
        for (String key : summary.keySet()) {
            if (!key.startsWith(id + ".")) {
                throw new IllegalArgumentException("summary key " + key + " must start with the section id " + id + ".");
            }
        }
    }

    /** Builds a section; summary keys are given without the section prefix. */
    public static Builder builder(String id, String title) {
        return new Builder(id, title);
    }

    /** Collects a section's parts. */
    public static final class Builder {
        private final String id;
        private final String title;
        private final List<String> paragraphs = new ArrayList<>();
        private final List<Table> tables = new ArrayList<>();
        private final List<Chart> charts = new ArrayList<>();
        private final Map<String, Object> summary = new LinkedHashMap<>();

        private Builder(String id, String title) {
            this.id = id;
            this.title = title;
        }

        public Builder paragraph(String text) {
            paragraphs.add(text);
            return this;
        }

        public Builder table(Table table) {
            tables.add(table);
            return this;
        }

        public Builder chart(Chart chart) {
            charts.add(chart);
            return this;
        }

        /** Records a figure under "sectionId.key"; NaN is written as null. */
        public Builder put(String key, Object value) {
            summary.put(id + "." + key, value);
            return this;
        }

        public String id() {
            return id;
        }

        public Section build() {
            return new Section(id, title, paragraphs, tables, charts, summary);
        }
    }
}
