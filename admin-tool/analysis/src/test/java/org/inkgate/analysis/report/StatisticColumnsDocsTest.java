package org.inkgate.analysis.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** docs/analysis.md's table of shared statistics names every label and CSV name of {@link StatisticColumns}. */
class StatisticColumnsDocsTest {
    private static final Path DOCS = Path.of(System.getProperty("user.dir")).resolve("../../docs/analysis.md");

    @Test
    void docsTable_listsEveryStatisticsLabelAndCsvName() throws Exception {
        String docs = Files.readString(DOCS);
        int from = docs.indexOf("Statistics shared by the many-facet tables");
        int to = docs.indexOf("Facet and grouping columns", from);
        assertTrue(from >= 0 && to > from, "docs/analysis.md lost its table of shared statistics");
        String table = docs.substring(from, to);
        int checked = 0;
        for (Field f : StatisticColumns.class.getFields()) {
            if (Modifier.isStatic(f.getModifiers()) && f.getType() == Column.class) {
                Column c = (Column) f.get(null);
                assertTrue(table.contains(c.label()), f.getName() + ": label '" + c.label() + "' not in the docs table");
                assertTrue(table.contains("`" + c.name() + "`") || c.name().equals(c.label()) && table.contains(
                        "the same word") && table.contains(c.label()), f.getName() + ": CSV name " + c.name()
                        + " not in the docs table");
                checked++;
            }
        }
        assertTrue(checked > 40, "checked " + checked);
    }
}
