package org.inkgate.client.sitting.open;

import java.util.Objects;
import org.inkgate.format.bundle.OpenedBundle;

/** The outcome of opening a bundle for a live sitting: the verified bundle, or why it was refused. */
public sealed interface SittingLoad {

    /** Every check passed; the sitting owns the bundle and closes it at exit. */
    record Opened(OpenedBundle bundle) implements SittingLoad {
        public Opened {
            Objects.requireNonNull(bundle, "bundle");
        }
    }

    /** Refused; the message says what and how to fix it, and nothing from the bundle is shown. */
    record Refused(String message) implements SittingLoad {
        public Refused {
            Objects.requireNonNull(message, "message");
        }
    }
}
