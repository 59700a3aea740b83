package org.inkgate.client.sitting.ui.overlay;

import java.util.function.Consumer;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.PasswordField;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.HBox;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;

/** Asks for the invigilator PIN over the candidate's screen; Escape or Cancel closes it. */
public final class PinPrompt extends StackPane {

    private final PasswordField pin = new PasswordField();
    private final Label error = Parts.errorLine("pinError");
    private final Button ok;

    public PinPrompt(Consumer<char[]> onPin, Runnable onCancel) {
        setId("pinPrompt");
        getStyleClass().add("overlay-shade");
        pin.setId("pinField");
        pin.setAccessibleText("Invigilator PIN");
        ok = Parts.primary("pinOk", "_Open", () -> onPin.accept(pin.getText().toCharArray()));
        Button cancel = Parts.plain("pinCancel", "_Cancel", onCancel);
        cancel.setCancelButton(true);
        pin.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ESCAPE) {
                onCancel.run();
            }
        });
        VBox card = new VBox(12,
                Parts.heading("Invigilator"),
                Parts.quiet("For the invigilator only. Candidates: please press Cancel."),
                Parts.fieldLabel("_PIN", pin), pin, error, new HBox(12, ok, cancel));
        card.getStyleClass().add("overlay-card");
        card.setMaxSize(520, VBox.USE_PREF_SIZE);
        StackPane.setAlignment(card, Pos.CENTER);
        getChildren().add(card);
    }

    /** Clears the field and puts focus in it. */
    public void reset() {
        pin.clear();
        error.setText("");
        ok.setDisable(false);
        pin.requestFocus();
    }

    public void busy() {
        ok.setDisable(true);
    }

    public void wrong(String message) {
        pin.clear();
        error.setText(message);
        error.setAccessibleText(message);
        ok.setDisable(false);
        pin.requestFocus();
    }
}
