package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** docs/formats.md's table of event types says exactly what {@link EventType} defines. */
class EventTypeDocsTest {

    private static final Path FORMATS = Path.of(System.getProperty("user.dir")).resolve("../../docs/formats.md");
    private static final Pattern TICKED = Pattern.compile("`([^`]+)`");

    /** One documented row: wire name, level, required keys, optional keys, as written. */
    record Row(String type, String level, List<String> required, List<String> optional) {
    }

    static Map<String, Row> documentedRows(List<String> lines) {
        int at = lines.indexOf("#### Event types");
        assertTrue(at >= 0, "docs/formats.md has no \"#### Event types\" heading");
        Map<String, Row> rows = new LinkedHashMap<>();
        boolean inTable = false;
        for (String line : lines.subList(at + 1, lines.size())) {
            if (line.startsWith("#")) {
                break;
            }
            if (line.startsWith("| type |")) {
                inTable = true;
                continue;
            }
            if (!inTable || line.startsWith("| ---")) {
                continue;
            }
            if (!line.startsWith("|")) {
                break; // the table ended
            }
            String[] cells = line.split("\\|", -1);
            Row row = new Row(ticked(cells[1]).get(0), cells[2].trim(), ticked(cells[3]), ticked(cells[4]));
            assertEquals(null, rows.put(row.type(), row), "documented twice: " + row.type());
        }
        return rows;
    }

    private static List<String> ticked(String cell) {
        List<String> out = new ArrayList<>();
        Matcher m = TICKED.matcher(cell);
        while (m.find()) {
            out.add(m.group(1));
        }
        return out;
    }

    @Test
    void formatsMd_eventTable_listsExactlyTheEnumWithItsLevelsAndKeys() throws Exception {
        Map<String, Row> documented = documentedRows(Files.readAllLines(FORMATS));
        Map<String, Row> defined = new LinkedHashMap<>();
        for (EventType t : EventType.values()) {
            defined.put(t.wireName(), new Row(t.wireName(), t.level().docName(), List.copyOf(t.requiredKeys()),
                    List.copyOf(t.optionalKeys())));
        }
        assertEquals(List.copyOf(defined.keySet()), List.copyOf(documented.keySet()),
                "the types of docs/formats.md (in order) against EventType's constants");
        for (Row d : defined.values()) {
            assertEquals(d, documented.get(d.type()), "docs/formats.md's row of " + d.type());
        }
    }

    @Test
    void documentedRows_aRowMissingAKey_isNoticed() {
        // the parser must see a difference, or the test above could not fail
        List<String> lines = Arrays.asList("#### Event types", "",
                "| type | level | required `data` keys | optional `data` keys | meaning |", "| --- | --- | --- | --- | --- |",
                "| `tool.query` | task | `tool`, `pack`, `query`, `hits` | | a lookup |", "", "## Next");
        Row row = documentedRows(lines).get("tool.query");
        assertEquals(List.of("tool", "pack", "query", "hits"), row.required());
        assertTrue(!row.required().equals(List.copyOf(EventType.TOOL_QUERY.requiredKeys())));
    }
}
