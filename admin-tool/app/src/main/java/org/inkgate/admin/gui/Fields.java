package org.inkgate.admin.gui;

import java.io.File;
import java.nio.file.Path;
import javafx.beans.property.StringProperty;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.stage.DirectoryChooser;
import javafx.stage.FileChooser;
import javafx.stage.Window;

/** Small builders the step views share: labelled path fields with a chooser, headings, notes. */
public final class Fields {

    /** What a path field chooses. */
    public enum Choose { FOLDER, OPEN_FILE, SAVE_FILE }

    private Fields() {
    }

    public static Label heading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("step-heading");
        l.setWrapText(true);
        return l;
    }

    /**
     * A step's result text in the monospaced result style: shown, and taking room, only while the
     * model has something to say.
     */
    public static Label result(String id, String accessibleText, javafx.beans.property.StringProperty text) {
        Label l = new Label();
        l.setId(id);
        l.setWrapText(true);
        l.getStyleClass().addAll("step-result", "mono");
        l.setAccessibleText(accessibleText);
        l.textProperty().bind(text);
        l.visibleProperty().bind(text.isNotEmpty());
        l.managedProperty().bind(l.visibleProperty());
        return l;
    }

    public static Label note(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("step-note");
        l.setWrapText(true);
        return l;
    }

    /** A text field bound to {@code value}, with a label that names it (also its accessible name) and a chooser button. */
    public static TextField pathRow(GridPane grid, int row, String id, String label, StringProperty value, Choose kind) {
        TextField field = new TextField();
        field.setId(id);
        field.textProperty().bindBidirectional(value);
        field.setAccessibleText(label);
        field.setPrefColumnCount(40);
        Label l = new Label(label);
        l.setLabelFor(field);
        l.setMnemonicParsing(false);
        // at 1024 pixels wide the field gives way, never the label or the button text
        l.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        Button choose = new Button("Choose...");
        choose.setId(id + "Choose");
        choose.setAccessibleText("Choose " + label.toLowerCase(java.util.Locale.ROOT));
        choose.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        choose.setOnAction(e -> choose(field, kind));
        choose.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE); // never cut to "..." in a narrow window
        HBox box = new HBox(8, field, choose);
        HBox.setHgrow(field, Priority.ALWAYS);
        grid.add(l, 0, row);
        grid.add(box, 1, row);
        GridPane.setHgrow(box, Priority.ALWAYS);
        return field;
    }

    public static void row(GridPane grid, int row, String label, Node control) {
        Label l = new Label(label);
        l.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        l.setLabelFor(control);
        grid.add(l, 0, row);
        grid.add(control, 1, row);
    }

    public static GridPane grid() {
        GridPane g = new GridPane();
        g.getStyleClass().add("step-form");
        g.setHgap(12);
        g.setVgap(10);
        return g;
    }

    /** Opens the chooser of {@code kind}, starting where the field points, and puts the choice into the field. */
    static void choose(TextField field, Choose kind) {
        Window owner = field.getScene() == null ? null : field.getScene().getWindow();
        Path current;
        try {
            current = field.getText().isBlank() ? null : Path.of(field.getText()).toAbsolutePath();
        } catch (java.nio.file.InvalidPathException e) {
            current = null; // a server store's address, say: the chooser starts where it likes
        }
        File start = current == null ? null : (current.toFile().isDirectory() ? current.toFile()
                : current.getParent() == null ? null : current.getParent().toFile());
        File chosen;
        switch (kind) {
            case FOLDER -> {
                DirectoryChooser c = new DirectoryChooser();
                if (start != null && start.isDirectory()) {
                    c.setInitialDirectory(start);
                }
                chosen = c.showDialog(owner);
            }
            case OPEN_FILE, SAVE_FILE -> {
                FileChooser c = new FileChooser();
                if (start != null && start.isDirectory()) {
                    c.setInitialDirectory(start);
                }
                chosen = kind == Choose.OPEN_FILE ? c.showOpenDialog(owner) : c.showSaveDialog(owner);
            }
            default -> throw new IllegalStateException();
        }
        if (chosen != null) {
            field.setText(chosen.getAbsolutePath());
        }
    }

    /** Makes a table column wrap its text over several lines instead of cutting it off. */
    public static <S> void wrap(javafx.scene.control.TableColumn<S, String> column) {
        column.setCellFactory(c -> new javafx.scene.control.TableCell<>() {
            private final javafx.scene.text.Text text = new javafx.scene.text.Text();
            {
                text.wrappingWidthProperty().bind(column.widthProperty().subtract(12));
                text.getStyleClass().add("wrapped-cell-text");
                setPrefHeight(javafx.scene.control.Control.USE_COMPUTED_SIZE);
            }

            @Override
            protected void updateItem(String item, boolean empty) {
                super.updateItem(item, empty);
                text.setText(empty || item == null ? "" : item);
                setGraphic(empty ? null : text);
                setAccessibleText(empty ? null : item);
            }
        });
    }

    /**
     * Keeps a step's path field and the session's shared path in step: what one step names, the
     * next step shows, and a path typed in a later step is carried back to the session.
     */
    public static void link(StringProperty field, javafx.beans.property.ObjectProperty<Path> shared) {
        if (shared.get() != null) {
            field.set(shared.get().toString());
        }
        shared.addListener((o, was, now) -> {
            if (now != null && !now.equals(path(field.get()))) {
                field.set(now.toString());
            }
        });
        field.addListener((o, was, now) -> {
            Path p = path(now);
            if (p != null && !p.equals(shared.get())) {
                shared.set(p);
            }
        });
    }

    /** The path in a text field, or null when it is blank. */
    public static Path path(String text) {
        return text == null || text.isBlank() ? null : Path.of(text.strip());
    }
}
