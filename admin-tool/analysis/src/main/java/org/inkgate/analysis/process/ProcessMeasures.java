package org.inkgate.analysis.process;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.inkgate.analysis.data.ProcessEvent;

/**
 * Writing-process measures of one response from its keystroke-level log.
 *
 * <p>Definitions (after Chenoweth &amp; Hayes 2001, Written Communication 18:80-98; Wengelin 2006;
 * Leijten &amp; Van Waes 2013 for the product/process ratio):
 * <ul>
 * <li>the task: its events up to and including its {@code task.end}; events logged after it (the
 * client closes the resource panel just after ending the task) are not part of it;</li>
 * <li>time on task: last event time minus first event time (with a store's log: {@code task.start}
 * to {@code task.end});</li>
 * <li>inter-key interval: time between consecutive text events (insert or delete);</li>
 * <li>pause: an inter-key interval of at least the threshold (default 2 s, common practice);</li>
 * <li>active writing time: the sum of inter-key intervals below the threshold;</li>
 * <li>revision: a run of consecutive deletions, or an insertion away from the leading edge (the
 * end of the text), counted once per run;</li>
 * <li>burst: characters inserted at the leading edge between two interruptions; a P-burst ends
 * in a pause, an R-burst ends in a revision (Chenoweth &amp; Hayes 2001); a burst still open at
 * the end of the log is counted as a P-burst;</li>
 * <li>product/process ratio: characters in the final text / characters inserted;</li>
 * <li>characters per minute: characters inserted per minute of time on task;</li>
 * <li>time in the resource panel: sum of the spans from a {@code panel.open} to the next
 * {@code panel.close} (a tab switch closes one page and opens another at the same moment; a
 * second {@code panel.open} while a span is open continues it); a span still open at the end of
 * the task closes there ({@code task.end}, or the last event);</li>
 * <li>lookup followed by use: a tool.query whose text (case-insensitive) appears in the text
 * inserted within the window after it (default 60 s).</li>
 * </ul>
 */
public record ProcessMeasures(String candidate, String task, double timeOnTaskS, double activeWritingS, int pauses,
        double meanPauseS, int pBursts, int rBursts, double meanPBurstChars, int revisions, long charsInserted,
        long finalChars, double productProcessRatio, double charsPerMinute, double panelTimeS, int lookups,
        int lookupsUsed) {

    /** Parameters: pause threshold and lookup window in milliseconds. */
    public record Parameters(long pauseThresholdMs, long lookupWindowMs) {
        public static final Parameters DEFAULT = new Parameters(2000, 60_000);

        public Parameters {
            if (pauseThresholdMs <= 0 || lookupWindowMs <= 0) {
                throw new IllegalArgumentException("pause threshold and lookup window must be positive milliseconds");
            }
        }
    }

    /** Measures of one response's events (all of the same candidate and task). */
    public static ProcessMeasures of(List<ProcessEvent> events, Parameters params) {
        List<ProcessEvent> ev = new ArrayList<>(events);
        ev.sort(Comparator.comparingLong(ProcessEvent::timeMs)); // stable: ties keep log order
        for (int i = 0; i < ev.size(); i++) {
            if (ev.get(i).type() == ProcessEvent.Type.TASK_END) {
                ev = new ArrayList<>(ev.subList(0, i + 1));
                break;
            }
        }
        String candidate = ev.get(0).candidate();
        String task = ev.get(0).task();
        long first = ev.get(0).timeMs();
        long last = ev.get(ev.size() - 1).timeMs();
        long length = 0, inserted = 0;
        long previousText = Long.MIN_VALUE;
        long active = 0, pauseTotal = 0;
        int pauses = 0, pBursts = 0, rBursts = 0, revisions = 0;
        long burstChars = 0, pBurstChars = 0;
        boolean inRevision = false;
        long panelOpenedAt = -1, panelTime = 0;
        StringBuilder insertedText = new StringBuilder();
        List<Long> insertTimes = new ArrayList<>();
        List<Integer> insertOffsets = new ArrayList<>();
        List<ProcessEvent> queries = new ArrayList<>();
        for (ProcessEvent e : ev) {
            switch (e.type()) {
                case INSERT, DELETE -> {
                    if (previousText != Long.MIN_VALUE) {
                        long gap = e.timeMs() - previousText;
                        if (gap >= params.pauseThresholdMs()) {
                            pauses++;
                            pauseTotal += gap;
                            if (burstChars > 0) {
                                pBursts++;
                                pBurstChars += burstChars;
                            }
                            burstChars = 0;
                        } else {
                            active += gap;
                        }
                    }
                    previousText = e.timeMs();
                    boolean atEdge = e.type() == ProcessEvent.Type.INSERT && e.position() >= length;
                    if (atEdge) {
                        burstChars += e.text().length();
                        inRevision = false;
                    } else {
                        if (!inRevision) {
                            revisions++;
                            if (burstChars > 0) {
                                rBursts++;
                            }
                            burstChars = 0;
                        }
                        // a deletion run or a run of mid-text insertions is one revision
                        inRevision = true;
                    }
                    if (e.type() == ProcessEvent.Type.INSERT) {
                        length += e.text().length();
                        inserted += e.text().length();
                        insertTimes.add(e.timeMs());
                        insertOffsets.add(insertedText.length());
                        insertedText.append(e.text());
                    } else {
                        length = Math.max(0, length - e.text().length());
                    }
                }
                case PANEL_OPEN -> {
                    if (panelOpenedAt < 0) {
                        panelOpenedAt = e.timeMs();
                    }
                }
                case PANEL_CLOSE -> {
                    if (panelOpenedAt >= 0) {
                        panelTime += e.timeMs() - panelOpenedAt;
                        panelOpenedAt = -1;
                    }
                }
                case TOOL_QUERY -> queries.add(e);
                case TASK_START, TASK_END -> {
                    // bounds only: they set time on task through first and last
                }
            }
        }
        if (panelOpenedAt >= 0) {
            panelTime += last - panelOpenedAt;
        }
        if (burstChars > 0) {
            pBursts++;
            pBurstChars += burstChars;
        }
        int used = 0;
        String lower = insertedText.toString().toLowerCase(Locale.ROOT);
        for (ProcessEvent q : queries) {
            String word = q.text().trim().toLowerCase(Locale.ROOT);
            if (word.isEmpty()) {
                continue;
            }
            int from = -1, to = -1;
            for (int i = 0; i < insertTimes.size(); i++) {
                long t = insertTimes.get(i);
                if (t >= q.timeMs() && t <= q.timeMs() + params.lookupWindowMs()) {
                    if (from < 0) {
                        from = insertOffsets.get(i);
                    }
                    to = i + 1 < insertOffsets.size() ? insertOffsets.get(i + 1) : lower.length();
                }
            }
            if (from >= 0 && lower.substring(from, to).contains(word)) {
                used++;
            }
        }
        double tot = (last - first) / 1000.0;
        return new ProcessMeasures(candidate, task, tot, active / 1000.0, pauses,
                pauses == 0 ? Double.NaN : pauseTotal / 1000.0 / pauses, pBursts, rBursts,
                pBursts == 0 ? Double.NaN : (double) pBurstChars / pBursts, revisions, inserted, length,
                inserted == 0 ? Double.NaN : (double) length / inserted, tot > 0 ? inserted / (tot / 60) : Double.NaN,
                panelTime / 1000.0, (int) queries.stream().filter(q -> !q.text().isBlank()).count(), used);
    }
}
