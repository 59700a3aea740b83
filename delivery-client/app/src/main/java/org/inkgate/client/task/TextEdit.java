package org.inkgate.client.task;

/**
 * One change to the answer, in UTF-16 offsets: {@code removed} characters at {@code position}
 * replaced by {@code inserted}.
 */
record TextEdit(int position, String removed, String inserted) {

    /** How far text after the change moved. */
    int shift() {
        return inserted.length() - removed.length();
    }

    /** The end of the removed range, in the text before the change. */
    int removedEnd() {
        return position + removed.length();
    }
}
