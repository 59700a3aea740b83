package org.inkgate.client.practice.ui;

import javafx.scene.AccessibleRole;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;

/** The plain statement, always on top, that practice mode is neither locked nor submitted. */
final class PracticeBanner extends VBox {

    static final String HEADLINE = "Practice mode: this machine is not locked and nothing is submitted.";
    static final String DETAIL = "What you write here is not saved or sent anywhere. The writing tools listed"
            + " for a task are not switched on in this preview.";

    /** The banner above an open exam: the headline and what it means for the writing. */
    PracticeBanner() {
        this(DETAIL);
    }

    /** The banner with another second line, or none when {@code detail} is empty. */
    PracticeBanner(String detail) {
        setId("practiceBanner");
        getStyleClass().add("practice-banner");
        Label headline = new Label(HEADLINE);
        headline.getStyleClass().add("practice-banner-headline");
        headline.setWrapText(true);
        getChildren().add(headline);
        if (!detail.isEmpty()) {
            Label second = new Label(detail);
            second.getStyleClass().add("practice-banner-detail");
            second.setWrapText(true);
            getChildren().add(second);
        }
        setAccessibleRole(AccessibleRole.TEXT);
        setAccessibleText(detail.isEmpty() ? HEADLINE : HEADLINE + " " + detail);
    }
}
