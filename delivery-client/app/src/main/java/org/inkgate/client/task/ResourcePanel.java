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
 * (so it cannot show a tool the broker did not construct). Which tool's page is in view is logged
 * as panel.open / panel.close.
 */
final class ResourcePanel extends VBox {

    private final List<ToolPage> pages;
    private final TabPane tabs = new TabPane();
    private final TaskEvents events;
    private ToolPage inView;

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
        tabs.getSelectionModel().selectedItemProperty().addListener((o, was, now) -> switched(now == null ? null : (ToolPage) now.getUserData()));
        switched(pages.get(0));
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

    /** Logs the page in view as closed (the workspace is going away). */
    void closed() {
        switched(null);
    }

    private void switched(ToolPage now) {
        if (inView == now) {
            return;
        }
        if (inView != null) {
            events.record(EventType.PANEL_CLOSE, "tool", TaskEvents.wire(inView.tool()));
        }
        inView = now;
        if (now != null) {
            events.record(EventType.PANEL_OPEN, "tool", TaskEvents.wire(now.tool()));
        }
    }
}
