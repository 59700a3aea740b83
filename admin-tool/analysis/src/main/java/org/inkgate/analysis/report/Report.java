package org.inkgate.analysis.report;

import java.util.List;

/** The whole report: a title, lines about the input and rules, and the sections in order. */
public record Report(String title, List<String> preamble, List<Section> sections) {

    public Report {
        preamble = List.copyOf(preamble);
        sections = List.copyOf(sections);
        long distinct = sections.stream().map(Section::id).distinct().count();
        if (distinct != sections.size()) {
            throw new IllegalArgumentException("two report sections share an id");
        }
    }
}
