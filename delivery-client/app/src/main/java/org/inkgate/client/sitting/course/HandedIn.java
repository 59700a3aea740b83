package org.inkgate.client.sitting.course;

import java.nio.file.Path;
import java.time.Instant;

/** Where a handed-in response package went, and when. */
public record HandedIn(Path delivered, Path localCopy, Instant at) {
}
