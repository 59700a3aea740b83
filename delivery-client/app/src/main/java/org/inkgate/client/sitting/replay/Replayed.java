package org.inkgate.client.sitting.replay;

/**
 * The outcome of a replay.
 *
 * @param text    the rebuilt text
 * @param caret   where the last change left the caret (the start caret when nothing was applied)
 * @param applied how many text events were applied
 * @param lastSeq the sequence number of the last event applied, 0 when none
 */
public record Replayed(String text, int caret, int applied, long lastSeq) {
}
