package org.inkgate.packs.spelling;

import java.util.List;
import org.inkgate.packs.event.ToolEvent;

/**
 * The issues of one whole text, with how much work it took.
 *
 * @param issues             every issue, ordered by position, offsets in the whole text
 * @param paragraphs         paragraphs in the text
 * @param paragraphsChecked  paragraphs LanguageTool had to check (the others came from the cache)
 * @param event              the use to record
 */
public record CheckResult(List<CheckIssue> issues, int paragraphs, int paragraphsChecked, ToolEvent event) {
    public CheckResult {
        issues = List.copyOf(issues);
    }
}
