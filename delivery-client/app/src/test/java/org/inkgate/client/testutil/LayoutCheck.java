package org.inkgate.client.testutil;

import java.util.ArrayList;
import java.util.List;
import javafx.geometry.BoundingBox;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBase;
import javafx.scene.control.ComboBoxBase;
import javafx.scene.control.IndexedCell;
import javafx.scene.control.Labeled;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Spinner;
import javafx.scene.control.TextInputControl;
import javafx.scene.text.Text;

/**
 * The layout assertion every screen test uses (issue 13, "screens that fit", WCAG 2.2 SC 1.4.4
 * "Resize Text" and 1.4.10 "Reflow": nothing a person needs may be cut off). Walks the scene graph
 * of a window after a layout pass and reports, in words a person can act on:
 * <ul>
 * <li>a control the candidate or invigilator operates (button, check box, text field, list,
 * spinner, combo box) that is not wholly inside the window and every clip above it (a split
 * pane's column, a tab's content): it is cut off. Below a vertically scrolling pane's fold is
 * allowed (it can be scrolled to), except for a screen's default button, which must be in view;</li>
 * <li>a label not wholly inside the window and the clips above it (below a scrolling pane's fold is allowed);</li>
 * <li>a list with room for fewer than two rows;</li>
 * <li>a list row whose text runs past the list's side, so it can only be read by scrolling
 * sideways (WCAG 1.4.10 allows one direction of scrolling, and the lists already scroll down);</li>
 * <li>a wrapped label whose column is narrower than one of its words (the word is broken);</li>
 * <li>a label or button whose shown text is not its whole text: the skin shortened it with an
 * ellipsis because it did not fit.</li>
 * </ul>
 * Only what is showing counts (visible up to the root, inside the scene). Cells of a list are
 * virtualised and scroll up and down by design, so only their text and its width are checked, not
 * their height.
 */
public final class LayoutCheck {

    /**
     * The window sizes (width, height) every screen is checked at, the ones a test centre meets:
     * 1024x768, the smallest laptop or projector mode; 1280x800; 1920x1080 (issue 13).
     */
    public static final int[][] SIZES = {{1024, 768}, {1280, 800}, {1920, 1080}};

    /** Sub-pixel slack: borders and focus rings land on half pixels. */
    private static final double SLACK = 1.0;

    private LayoutCheck() {
    }

    /** Lays the scene out and returns every problem found, empty when everything fits. Call on the JavaFX thread. */
    public static List<String> problems(Scene scene) {
        Parent root = scene.getRoot();
        root.applyCss();
        root.layout();
        Bounds window = new BoundingBox(0, 0, scene.getWidth(), scene.getHeight());
        List<String> out = new ArrayList<>();
        walk(root, window, window, false, out);
        return out;
    }

    /** Throws an AssertionError naming every problem, with {@code where} (screen, size, print) in front. Call on the JavaFX thread. */
    public static void assertFits(Scene scene, String where) {
        List<String> found = problems(scene);
        if (!found.isEmpty()) {
            throw new AssertionError(where + ": " + found.size() + " layout problem(s):\n  " + String.join("\n  ", found));
        }
    }

    /**
     * @param inView    what of the window this node can show: the window cut by every clip above it
     * @param reachable the same, except that a vertically scrolling pane's viewport limits only the width:
     *                  what lies below it can be scrolled to (WCAG 1.4.10 allows scrolling in one direction)
     * @param scroller  a vertically scrolling pane is above, and its viewport clip is not met yet
     */
    private static void walk(Node node, Bounds inView, Bounds reachable, boolean scroller, List<String> out) {
        if (!node.isVisible() || node.getOpacity() == 0) {
            return;
        }
        Bounds inScene = node.localToScene(node.getLayoutBounds());
        if (node.getClip() != null) {
            Bounds clip = node.localToScene(node.getClip().getBoundsInParent());
            inView = intersect(inView, clip);
            reachable = scroller ? new BoundingBox(Math.max(reachable.getMinX(), clip.getMinX()), -1e9,
                    Math.max(0, Math.min(reachable.getMaxX(), clip.getMaxX()) - Math.max(reachable.getMinX(), clip.getMinX())), 2e9)
                    : intersect(reachable, clip);
            scroller = false;
        }
        if (node instanceof ScrollPane pane && pane.getVbarPolicy() != ScrollPane.ScrollBarPolicy.NEVER) {
            scroller = true;
        }
        boolean cell = node instanceof IndexedCell<?>;
        // the button Enter presses moves the screen on: it must be in view without scrolling
        boolean mustBeInView = node instanceof Button b && b.isDefaultButton();
        Bounds area = mustBeInView ? inView : reachable;
        if (!cell && node instanceof Labeled && !operated(node) && !inTabHeader(node) && inScene.getWidth() > 0
                && inScene.getHeight() > 0 && !inside(inScene, reachable)) {
            out.add(describe(node) + " at " + rect(inScene) + " is cut off: it must lie inside " + rect(reachable));
        }
        if (!cell && operated(node) && inScene.getWidth() > 0 && inScene.getHeight() > 0 && !inside(inScene, area)) {
            out.add(describe(node) + " at " + rect(inScene) + " is cut off" + (mustBeInView ? " or below the fold" : "")
                    + ": it must lie inside " + rect(area));
        }
        if (cell && node instanceof ListCell<?> row && !row.isEmpty() && row.getListView() != null) {
            Bounds text = textBounds(row);
            if (text != null && text.getWidth() > 0
                    && (text.getMinX() < inView.getMinX() - SLACK || text.getMaxX() > inView.getMaxX() + SLACK)) {
                out.add(describe(node) + " in " + describe(row.getListView()) + " runs past the list's side: its text at "
                        + rect(text) + " must lie across " + String.format(java.util.Locale.ROOT, "x %.0f..%.0f",
                                inView.getMinX(), inView.getMaxX()) + " (wrap the row, or widen the list)");
            }
        }
        if (node instanceof Labeled labeled && inScene.getWidth() > 0) {
            String shown = shownText(labeled);
            String whole = wholeText(labeled);
            if (shown != null && !whole.isEmpty() && !shown.equals(whole)) {
                out.add(describe(node) + " shows \"" + shown + "\" instead of \"" + whole + "\" (shortened to fit "
                        + rect(inScene) + ")");
            } else if (shown != null && labeled.isWrapText()) {
                String broken = wordWiderThan(labeled, whole);
                if (broken != null) {
                    out.add(describe(node) + " breaks the word \"" + broken + "\" across lines: its column is too narrow ("
                            + rect(inScene) + ")");
                }
            }
        }
        if (node instanceof ListView<?> list && !cell && inScene.getHeight() > 0) {
            double rows = rowsShown(list);
            if (rows < 2) {
                out.add(describe(node) + " has room for " + String.format(java.util.Locale.ROOT, "%.1f", rows)
                        + " row(s) at " + rect(inScene) + ": a list needs room for at least two");
            }
        }
        if (node instanceof Parent parent) {
            for (Node child : parent.getChildrenUnmodifiable()) {
                walk(child, inView, reachable, scroller, out);
            }
        }
    }

    /** The first word of the text that is wider than the label's content width, or null. */
    private static String wordWiderThan(Labeled labeled, String whole) {
        double room = labeled.getWidth() - labeled.snappedLeftInset() - labeled.snappedRightInset();
        Text probe = new Text();
        probe.setFont(labeled.getFont());
        for (String token : whole.split("\\s+")) {
            // words of a language; a file path or key may wrap anywhere
            String word = token.replaceAll("^[\\p{P}]+|[\\p{P}]+$", "");
            if (!word.matches("[\\p{L}'\u2019-]+")) {
                continue;
            }
            probe.setText(word);
            if (!word.isEmpty() && probe.getLayoutBounds().getWidth() > room + SLACK) {
                return word;
            }
        }
        return null;
    }

    /** How many rows of its cells a list has room for (one cell's height, or 1.5 lines of its font when it has none). */
    private static double rowsShown(ListView<?> list) {
        double row = list.getFixedCellSize() > 0 ? list.getFixedCellSize() : 0;
        for (Node n : list.lookupAll(".list-cell")) {
            if (n.isVisible() && n.getLayoutBounds().getHeight() > 0) {
                row = Math.max(row, n.getLayoutBounds().getHeight());
                break;
            }
        }
        if (row <= 0) {
            row = javafx.scene.text.Font.getDefault().getSize() * 1.5;
            for (Node n : list.lookupAll(".label")) {
                if (n instanceof Labeled placeholder) {
                    row = placeholder.getFont().getSize() * 1.5;
                    break;
                }
            }
        }
        double inside = list.getHeight() - list.snappedTopInset() - list.snappedBottomInset();
        return inside / row;
    }

    /**
     * A tab's title: when the tabs do not fit, the tab pane itself offers the hidden ones in its
     * overflow menu, and the panel's shortcuts reach every page; so a tab title past the edge is
     * not reported (a known limit in large print on a narrow panel).
     */
    private static boolean inTabHeader(Node n) {
        for (Node p = n.getParent(); p != null; p = p.getParent()) {
            if (p.getStyleClass().contains("tab-header-area")) {
                return true;
            }
        }
        return false;
    }

    private static boolean operated(Node n) {
        return n instanceof ButtonBase || n instanceof TextInputControl || n instanceof ListView<?>
                || n instanceof Spinner<?> || n instanceof ComboBoxBase<?>;
    }

    /** The text the skin draws: its Text child (LabeledText); null before a skin exists or when only the graphic shows. */
    private static String shownText(Labeled labeled) {
        for (Node child : labeled.getChildrenUnmodifiable()) {
            if (child instanceof Text text && child.getStyleClass().contains("text")) {
                return child.isVisible() ? text.getText() : null;
            }
        }
        return null;
    }

    /** Where the skin draws a labeled's text, in the scene; null when it draws none. */
    private static Bounds textBounds(Labeled labeled) {
        for (Node child : labeled.getChildrenUnmodifiable()) {
            if (child instanceof Text && child.getStyleClass().contains("text") && child.isVisible()) {
                return child.localToScene(child.getLayoutBounds());
            }
        }
        return null;
    }

    /** The labeled's text as it should read: a mnemonic's underscore is not drawn. */
    private static String wholeText(Labeled labeled) {
        String t = labeled.getText() == null ? "" : labeled.getText();
        if (labeled.isMnemonicParsing()) {
            int at = t.indexOf('_');
            while (at >= 0 && at + 1 < t.length() && t.charAt(at + 1) == '_') {
                at = t.indexOf('_', at + 2);
            }
            if (at >= 0 && at + 1 < t.length()) {
                t = t.substring(0, at) + t.substring(at + 1);
            }
            t = t.replace("__", "_");
        }
        return t;
    }

    private static boolean inside(Bounds b, Bounds area) {
        return b.getMinX() >= area.getMinX() - SLACK && b.getMinY() >= area.getMinY() - SLACK
                && b.getMaxX() <= area.getMaxX() + SLACK && b.getMaxY() <= area.getMaxY() + SLACK;
    }

    private static Bounds intersect(Bounds a, Bounds b) {
        double minX = Math.max(a.getMinX(), b.getMinX());
        double minY = Math.max(a.getMinY(), b.getMinY());
        double maxX = Math.min(a.getMaxX(), b.getMaxX());
        double maxY = Math.min(a.getMaxY(), b.getMaxY());
        return new BoundingBox(minX, minY, Math.max(0, maxX - minX), Math.max(0, maxY - minY));
    }

    private static String describe(Node n) {
        String kind = n.getClass().getSimpleName().isEmpty() ? n.getClass().getName() : n.getClass().getSimpleName();
        String id = n.getId() == null ? "" : " #" + n.getId();
        String text = n instanceof Labeled l && l.getText() != null && !l.getText().isEmpty() ? " \"" + wholeText(l) + "\"" : "";
        return kind + id + text;
    }

    private static String rect(Bounds b) {
        return String.format(java.util.Locale.ROOT, "[x %.0f..%.0f, y %.0f..%.0f]", b.getMinX(), b.getMaxX(), b.getMinY(), b.getMaxY());
    }
}
