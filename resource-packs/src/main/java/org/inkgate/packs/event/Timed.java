package org.inkgate.packs.event;

/**
 * A tool's answer with the event that records it; the client shows the value and logs the event.
 *
 * @param value what the tool returned
 * @param event the use to record
 * @param <T>   the answer's type
 */
public record Timed<T>(T value, ToolEvent event) {
}
