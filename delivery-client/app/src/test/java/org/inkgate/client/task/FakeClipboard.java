package org.inkgate.client.task;

/** A clipboard the test fills as another program would. */
final class FakeClipboard implements ClipboardAccess {
    private String text;

    FakeClipboard(String initial) {
        this.text = initial;
    }

    @Override
    public synchronized String readText() {
        return text;
    }

    @Override
    public synchronized void writeText(String t) {
        text = t;
    }

    /** Another program puts text on the clipboard. */
    synchronized void fromOutside(String t) {
        text = t;
    }
}
