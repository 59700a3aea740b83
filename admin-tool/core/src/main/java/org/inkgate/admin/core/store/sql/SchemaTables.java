package org.inkgate.admin.core.store.sql;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The tables of {@link Schema}, read from its statements, so that a table a later migration adds is
 * copied and digested the day it is added: every {@code CREATE TABLE}, ordered so that a table
 * comes after every table it references ({@code REFERENCES}, also in a later {@code ALTER TABLE ...
 * ADD COLUMN}); ties keep the schema's order; a table a later migration drops is left out. Views are not tables: they hold no rows of their own.
 */
public final class SchemaTables {

    private static final Pattern CREATE = Pattern.compile("^\\s*CREATE TABLE (\\w+)");
    private static final Pattern ALTER = Pattern.compile("^\\s*ALTER TABLE (\\w+) ADD COLUMN");
    private static final Pattern DROP = Pattern.compile("^\\s*DROP TABLE (\\w+)");
    private static final Pattern REFERENCES = Pattern.compile("REFERENCES (\\w+)");

    private SchemaTables() {
    }

    /** Every table, referenced tables first. */
    public static List<String> inCopyOrder() {
        Map<String, Set<String>> references = new LinkedHashMap<>();
        for (Schema.Migration m : Schema.ALL) {
            for (String statement : m.statements()) {
                Matcher drop = DROP.matcher(statement);
                if (drop.find()) {
                    references.remove(drop.group(1)); // a view of the same name may take its place
                    continue;
                }
                Matcher create = CREATE.matcher(statement);
                Matcher alter = ALTER.matcher(statement);
                String table = create.find() ? create.group(1) : alter.find() ? alter.group(1) : null;
                if (table == null) {
                    continue;
                }
                Set<String> refs = references.computeIfAbsent(table, t -> new LinkedHashSet<>());
                Matcher r = REFERENCES.matcher(statement);
                while (r.find()) {
                    if (!r.group(1).equals(table)) {
                        refs.add(r.group(1));
                    }
                }
            }
        }
        List<String> out = new ArrayList<>();
        while (out.size() < references.size()) {
            int before = out.size();
            for (var e : references.entrySet()) {
                if (!out.contains(e.getKey()) && out.containsAll(e.getValue())) {
                    out.add(e.getKey());
                    break; // start again from the top: the schema's order among the tables now free
                }
            }
            if (out.size() == before) {
                throw new IllegalStateException("the schema's tables reference each other in a cycle: " + references);
            }
        }
        return List.copyOf(out);
    }
}
