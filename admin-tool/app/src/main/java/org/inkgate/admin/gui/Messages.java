package org.inkgate.admin.gui;

import java.io.IOException;
import java.nio.file.NoSuchFileException;
import org.inkgate.admin.core.collection.CollectionRun;
import org.inkgate.admin.core.keys.EncryptedKeys;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.format.refusal.FormatRefusal;

/** Turns a failure into a message for people: what went wrong and what to do, never a stack trace. */
public final class Messages {

    private Messages() {
    }

    public static String of(Throwable failure) {
        Throwable e = failure;
        while (e instanceof RuntimeException && e.getCause() != null && e.getMessage() == null) {
            e = e.getCause();
        }
        String m = e.getMessage() == null ? "" : e.getMessage();
        return switch (e) {
            case NoSuchFileException n -> "There is no file or folder " + n.getFile() + ". Check the path and try again.";
            case InvalidSourceException i -> m;
            case EncryptedKeys.WrongPassphraseException w -> m + " Nothing was changed.";
            case CollectionRun.BundleRefusedException b -> m + " Nothing was imported.";
            case StoreException s -> "The results store: " + m + " Nothing else was changed.";
            // the rating steps say themselves that nothing changed; the message is the command's
            case org.inkgate.admin.core.rating.RatingException r -> m;
            case FormatRefusal r -> m;
            case org.inkgate.admin.study.AnalysisRun.Refused a -> m; // the step says itself that no report was written
            case IOException io -> "A file could not be read or written: " + m + ". Check the path and permissions.";
            case IllegalArgumentException ia -> m;
            default -> "Unexpected problem (" + e.getClass().getSimpleName() + "): " + m
                    + ". Nothing was changed by the step that failed; please report this with the steps that led to it.";
        };
    }
}
