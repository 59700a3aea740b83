package org.inkgate.client.sitting.ui;

import javafx.scene.AccessibleAttribute;
import javafx.scene.AccessibleRole;
import javafx.scene.control.Label;
import javafx.scene.layout.Region;

/**
 * Status messages (time warnings, pause, resumed) shown in a visible strip and handed to screen
 * readers without moving focus (WCAG 4.1.3 Status Messages): the label's accessible text changes
 * and the change is notified, which the platform's accessibility bridge announces.
 */
public final class Announcer extends Label {

    public Announcer() {
        setId("announcement");
        getStyleClass().add("announcement");
        setAccessibleRole(AccessibleRole.TEXT);
        setWrapText(true);
        setMaxWidth(Double.MAX_VALUE);
        setMinHeight(Region.USE_PREF_SIZE);
        clear();
    }

    /** Shows and announces the message. */
    public void announce(String message) {
        setText(message);
        setAccessibleText(message);
        setVisible(true);
        setManaged(true);
        notifyAccessibleAttributeChanged(AccessibleAttribute.TEXT);
    }

    /** Hides the strip. */
    public void clear() {
        setText("");
        setAccessibleText("");
        setVisible(false);
        setManaged(false);
    }
}
