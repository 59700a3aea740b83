package org.inkgate.client.task;

import java.util.List;
import java.util.Optional;
import javafx.beans.InvalidationListener;
import javafx.beans.value.ChangeListener;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Window;
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
    private final InvalidationListener changed = o -> update();
    private final ChangeListener<Window> windowSwap = (o, before, after) -> {
        watchWindow(before, after);
        update();
    };

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
            // fits the panel when there is room; on a short window or in large print the page scrolls, so
            // no list is squeezed to nothing and no button drops out of sight
            ScrollPane page = new ScrollPane(p.content());
            page.setFitToWidth(true);
            page.setFitToHeight(true);
            page.setFocusTraversable(false);
            page.getStyleClass().add("tool-scroll");
            Tab tab = new Tab(p.title().replace("_", ""), page);
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
        // read from the scene's focus owner and the window's focus, not focusWithin (which the rehearsal saw
        // stay true after focus had gone back to the answer)
        sceneProperty().addListener((o, was, now) -> {
            detach(was);
            attach(now);
            update();
        });
    }

    private void attach(Scene scene) {
        if (scene != null) {
            scene.focusOwnerProperty().addListener(changed);
            scene.windowProperty().addListener(windowSwap);
            watchWindow(null, scene.getWindow());
        }
    }

    private void detach(Scene scene) {
        if (scene != null) {
            scene.focusOwnerProperty().removeListener(changed);
            scene.windowProperty().removeListener(windowSwap);
            watchWindow(scene.getWindow(), null);
        }
    }

    private void watchWindow(Window before, Window after) {
        if (before != null) {
            before.focusedProperty().removeListener(changed);
        }
        if (after != null) {
            after.focusedProperty().addListener(changed);
        }
    }

    /** Whether keyboard focus is inside the panel, in a focused window. */
    private boolean focusInside() {
        Scene scene = getScene();
        if (scene == null || scene.getWindow() == null || !scene.getWindow().isFocused()) {
            return false;
        }
        for (Node n = scene.getFocusOwner(); n != null; n = n.getParent()) {
            if (n == this) {
                return true;
            }
        }
        return false;
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
        detach(getScene()); // the scene and window outlive the task
    }

    /** Logs the transitions of (in the panel, page in view): out to in opens, in to out closes, a switch does both. */
    private void update() {
        ToolPage now = !closed && focusInside() ? inView : null;
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
