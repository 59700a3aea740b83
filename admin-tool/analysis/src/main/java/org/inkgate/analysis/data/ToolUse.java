package org.inkgate.analysis.data;

/**
 * One candidate's use of one writing tool in one task: how often it was used, how many queries
 * found nothing, how many suggestions were accepted and ignored.
 */
public record ToolUse(String candidate, String task, String tool, long uses, long emptyQueries,
        long suggestionsAccepted, long suggestionsIgnored) {
}
