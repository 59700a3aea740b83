package org.inkgate.admin.core.store;

/** A results store operation failed; nothing of it was kept (each operation is one transaction). */
public final class StoreException extends Exception {
    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }

    public StoreException(String message) {
        super(message);
    }
}
