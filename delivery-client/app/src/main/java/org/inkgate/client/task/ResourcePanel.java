package org.inkgate.client.task;

import java.util.List;
import java.util.Optional;
import javafx.scene.control.Label;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.inkgate.format.response.EventType;
import org.inkgate.packs.policy.Tool;

/**
 * The resource panel: one tab per tool the task offers, built only from the pages it is given
 * (so it cannot show a tool the broker did not construct).
 *
 * <p>The panel stands beside the answer for the whole task, so being on screen says nothing about
 * use. The candidate is <em>in the panel</em> while keyboard focus is inside it (a click into it,
 * a tool's shortcut, F6 from the answer) and the window has focus; {@code panel.open} is logged
 * with the page in view when they come in, {@code panel.close} when focus goes back to the
 * answer or elsewhere, the window loses focus (another program took it: focus.lost) or the
 * workspace closes. A tab switch while in the panel closes one page and opens the other at the
 * same moment. So time in the panel is time spent using it, as the researcher needs it.
 */
final class ResourcePanel extends VBox {

    private final List<ToolPage> pages;
    private final TabPane tabs = new TabPane();
    private final TaskEvents events;
    /** The page whose tab is selected. */
    private ToolPage inView;
    /** The page logged as open (the candidate is in the panel), or null. */
    private ToolPage logged;
    private boolean closed;

    ResourcePanel(List<ToolPage> pages, TaskEvents events, String shortcutsHelp) {
        if (pages.isEmpty()) {
            throw new IllegalArgumentException("a task with no tools has no resource panel");
        }
        this.pages = List.copyOf(pages);
        this.events = events;
        setId("resourcePanel");
        getStyleClass().add("resource-panel");
        Label heading = ToolPage.wrapped("Writing tools for this task", "panel-heading");
        heading.setId("panelHeading");
        tabs.setId("toolTabs");
        tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        for (ToolPage p : pages) {
            Tab tab = new Tab(p.title().replace("_", ""), p.content());
            tab.setId("tab-" + TaskEvents.wire(p.tool()));
            tab.setUserData(p);
            tabs.getTabs().add(tab);
        }
        VBox.setVgrow(tabs, Priority.ALWAYS);
        Label keys = ToolPage.wrapped(shortcutsHelp, "panel-note");
        keys.setId("panelKeys");
        getChildren().addAll(heading, tabs, keys);
        inView = pages.get(0);
        tabs.getSelectionModel().selectedItemProperty().addListener((o, was, now) -> {
            inView = now == null ? null : (ToolPage) now.getUserData();
            update();
        });
        // focus within is false while the window has no focus (JavaFX sets a node focused only in a focused window)
        focusWithinProperty().addListener((o, was, now) -> update());
    }

    /** The pages, in tab order. */
    List<ToolPage> pages() {
        return pages;
    }

    /** The tools that have a page here, in tab order. */
    List<Tool> tools() {
        return pages.stream().map(ToolPage::tool).toList();
    }

    /** Brings a tool's page into view and puts focus where its use starts; false if the panel has no such page. */
    boolean open(Tool tool) {
        Optional<Tab> tab = tabs.getTabs().stream().filter(t -> ((ToolPage) t.getUserData()).tool() == tool).findFirst();
        if (tab.isEmpty()) {
            return false;
        }
        tabs.getSelectionModel().select(tab.get());
        ((ToolPage) tab.get().getUserData()).focusStart();
        return true;
    }

    /** Puts focus in the page in view. */
    void focusInView() {
        if (inView != null) {
            inView.focusStart();
        }
    }

    /** Ends the candidate's time in the panel, if they are in it (the workspace is going away). */
    void closed() {
        closed = true;
        update();
    }

    /** Logs the transitions of (in the panel, page in view): out to in opens, in to out closes, a switch does both. */
    private void update() {
        ToolPage now = !closed && isFocusWithin() ? inView : null;
        if (logged == now) {
            return;
        }
        if (logged != null) {
            events.record(EventType.PANEL_CLOSE, "tool", TaskEvents.wire(logged.tool()));
        }
        logged = now;
        if (now != null) {
            events.record(EventType.PANEL_OPEN, "tool", TaskEvents.wire(now.tool()));
        }
    }
}
