package org.inkgate.admin.gui;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.property.StringProperty;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;

/**
 * The results store field of the steps: a store file or a PostgreSQL store's address, read by
 * {@link StoreLocation#parse} as {@code --store} is, and for a server store a password file (as
 * {@code --store-password-file}) or, left blank, PGPASSWORD, PGPASSFILE and ~/.pgpass. The window
 * never asks for the password itself, so it is never on screen nor in the window's memory.
 */
public final class StoreField {

    /** The hint in an empty store field. */
    static final String PROMPT = "a store file, or postgresql://user@host:5432/database";

    private StoreField() {
    }

    /**
     * The store row: the store field with its file chooser, and under it, shown while the field
     * holds a server address, the password file field ({@code id + "PasswordFile"}) with its own.
     */
    public static TextField row(GridPane grid, int row, String id, String label, StringProperty store,
            StringProperty passwordFile, Fields.Choose kind) {
        TextField field = new TextField();
        field.setId(id);
        field.textProperty().bindBidirectional(store);
        field.setAccessibleText(label);
        field.setPromptText(PROMPT);
        field.setPrefColumnCount(40);
        Label l = new Label(label);
        l.setLabelFor(field);
        l.setMnemonicParsing(false);
        l.setMinWidth(Region.USE_PREF_SIZE);
        HBox storeBox = new HBox(8, field, chooser(id, label, field, kind));
        HBox.setHgrow(field, Priority.ALWAYS);

        TextField password = new TextField();
        password.setId(id + "PasswordFile");
        password.textProperty().bindBidirectional(passwordFile);
        password.setAccessibleText("Password file of the PostgreSQL store");
        password.setPromptText("blank: PGPASSWORD, then PGPASSFILE, then ~/.pgpass");
        Label pl = new Label("Password file");
        pl.setLabelFor(password);
        pl.setMinWidth(Region.USE_PREF_SIZE);
        HBox passwordBox = new HBox(8, pl, password, chooser(id + "PasswordFile", "Password file", password,
                Fields.Choose.OPEN_FILE));
        passwordBox.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        HBox.setHgrow(password, Priority.ALWAYS);
        Label note = Fields.note("For a PostgreSQL store: " + StoreLocation.PASSWORD_SOURCES + ". The window never"
                + " asks for the password itself.");
        VBox serverPart = new VBox(4, passwordBox, note);
        BooleanBinding server = Bindings.createBooleanBinding(() -> isServer(store.get()), store);
        serverPart.visibleProperty().bind(server);
        serverPart.managedProperty().bind(server);

        VBox box = new VBox(6, storeBox, serverPart);
        grid.add(l, 0, row);
        grid.add(box, 1, row);
        GridPane.setValignment(l, javafx.geometry.VPos.TOP);
        GridPane.setHgrow(box, Priority.ALWAYS);
        return field;
    }

    private static Button chooser(String id, String label, TextField field, Fields.Choose kind) {
        Button choose = new Button("Choose...");
        choose.setId(id + "Choose");
        choose.setAccessibleText("Choose " + label.toLowerCase(java.util.Locale.ROOT));
        choose.setMinWidth(Region.USE_PREF_SIZE); // never cut to "..." in a narrow window
        choose.setOnAction(e -> Fields.choose(field, kind));
        return choose;
    }

    /** True when {@code text} is a PostgreSQL store's address (well formed or not), false for a file or blank. */
    public static boolean isServer(String text) {
        if (text == null || text.isBlank()) {
            return false;
        }
        try {
            return StoreLocation.parse(text) instanceof StoreLocation.Server;
        } catch (StoreException e) {
            return true; // a URL the parser refuses: the refusal is shown when the store is used
        } catch (java.nio.file.InvalidPathException e) {
            return false; // no URL, and no file name either: said when the store is used
        }
    }

    /**
     * The store named in the field, with the password file for a server store; a store file takes
     * none (the password file field is hidden then, and a path left in it is not used).
     *
     * @throws StoreException for a blank field or an address that cannot be used, saying what to give instead
     */
    public static StoreLocation location(String text, String passwordFile) throws StoreException {
        StoreLocation at = StoreLocation.parse(text == null ? null : text.strip());
        Path file = Fields.path(passwordFile);
        return at instanceof StoreLocation.Server s && file != null ? s.withPasswordFile(file) : at;
    }

    /**
     * As {@link #location}, for the steps that read a store collect made: a store file must be
     * there; a server store is checked when it is opened (and a missing one is then named).
     */
    public static StoreLocation existing(String text, String passwordFile) throws StoreException {
        if (text == null || text.isBlank()) {
            throw new StoreException("There is no results store named. Collect first (step 4) or name the store"
                    + " file or the PostgreSQL store's address.");
        }
        StoreLocation at = location(text, passwordFile);
        if (at instanceof StoreLocation.File f && !Files.isRegularFile(f.path())) {
            throw new StoreException("There is no results store at " + f.path() + ". Collect first (step 4) or name the"
                    + " store file.");
        }
        return at;
    }

    /**
     * Keeps a step's store field and the session's store in step, as {@link Fields#link} does for
     * paths; the text is kept as typed (an address is no path: a path would fold its "//").
     */
    public static void link(StringProperty field, StringProperty shared) {
        if (!shared.get().isBlank()) {
            field.set(shared.get());
        }
        shared.addListener((o, was, now) -> {
            if (now != null && !now.isBlank() && !now.strip().equals(field.get().strip())) {
                field.set(now);
            }
        });
        field.addListener((o, was, now) -> {
            if (now != null && !now.isBlank() && !now.strip().equals(shared.get().strip())) {
                shared.set(now.strip());
            }
        });
    }
}
