package org.inkgate.client.task;

import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.layout.Region;
import org.inkgate.packs.policy.Tool;

/** One tool's page in the resource panel. */
interface ToolPage {

    /** The tool this page offers (for logging panel.open/close). */
    Tool tool();

    /** The tab title, with its mnemonic. */
    String title();

    /** The page's content. */
    Node content();

    /** Puts focus where the candidate starts using the tool (its search box or list). */
    void focusStart();

    /** A wrapped label that grows to its text. */
    static Label wrapped(String text, String styleClass) {
        Label l = new Label(text);
        l.setWrapText(true);
        l.setMinHeight(Region.USE_PREF_SIZE);
        l.getStyleClass().add(styleClass);
        return l;
    }
}
