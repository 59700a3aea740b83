package org.inkgate.format.response;

/**
 * A summary of one tool's use in one task; the events give every use in detail.
 *
 * @param queries             lookups made (glossary, dictionary)
 * @param emptyQueries        lookups that found nothing
 * @param entriesOpened       entries opened from results
 * @param suggestionsShown    spelling or grammar suggestions shown
 * @param suggestionsAccepted suggestions accepted
 * @param suggestionsIgnored  flags dismissed ("ignore this word")
 * @param insertions          insertions of text from the panel into the answer
 */
public record ToolUse(int queries, int emptyQueries, int entriesOpened, int suggestionsShown, int suggestionsAccepted,
        int suggestionsIgnored, int insertions) {
}
