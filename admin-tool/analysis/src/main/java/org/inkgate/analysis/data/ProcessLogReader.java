package org.inkgate.analysis.data;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reads a writing-process log exported as CSV: {@code candidate,task,time_ms,type,position,text}.
 * Types other than those of {@link ProcessEvent.Type} are refused (so that a misspelt type is
 * not silently ignored); position may be empty for tool events.
 */
public final class ProcessLogReader {

    private ProcessLogReader() {
    }

    public static List<ProcessEvent> read(String file, Reader reader) throws IOException, InputRejected {
        CsvTable t = CsvTable.open(file, reader);
        List<InputProblem> problems = new ArrayList<>();
        int[] pos = Columns.require(t, problems, "candidate", "task", "time_ms", "type", "position", "text");
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        Columns cols = new Columns();
        List<ProcessEvent> out = new ArrayList<>();
        CsvTable.Row row;
        while ((row = t.next()) != null) {
            if (!Columns.widthOk(t, row, problems)) {
                continue;
            }
            String c = cols.text(t, row, pos[0], "candidate", true, problems);
            String task = cols.text(t, row, pos[1], "task", true, problems);
            long time = 0;
            try {
                time = Long.parseLong(row.cells()[pos[2]].trim());
            } catch (NumberFormatException e) {
                problems.add(new InputProblem(file, row.number(), "time_ms", "'" + row.cells()[pos[2]]
                        + "' is not a whole number of milliseconds"));
            }
            String typeText = row.cells()[pos[3]].trim();
            ProcessEvent.Type type = ProcessEvent.Type.parse(typeText);
            if (type == null) {
                problems.add(new InputProblem(file, row.number(), "type", "unknown event type '" + typeText
                        + "'; expected one of " + Arrays.stream(ProcessEvent.Type.values())
                                .map(ProcessEvent.Type::logName).toList()));
            }
            int position = -1;
            String p = row.cells()[pos[4]].trim();
            boolean textEvent = type == ProcessEvent.Type.INSERT || type == ProcessEvent.Type.DELETE;
            if (textEvent || !p.isEmpty()) {
                try {
                    position = Integer.parseInt(p);
                    if (position < 0) {
                        throw new NumberFormatException();
                    }
                } catch (NumberFormatException e) {
                    problems.add(new InputProblem(file, row.number(), "position", "'" + p
                            + "' is not a character position (a whole number >= 0); text events need one"));
                }
            }
            String text = row.cells()[pos[5]];
            if (textEvent && text.isEmpty()) {
                problems.add(new InputProblem(file, row.number(), "text", "a text event needs the inserted or deleted text"));
            }
            out.add(new ProcessEvent(c, task, time, type, position, text));
            Columns.stopIfFull(problems);
        }
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        return out;
    }
}
