package org.inkgate.client.sitting.ui.screen;

import java.util.function.Consumer;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;

/** The candidate signs in with their candidate number. */
public final class SignInScreen {

    private final TextField number = new TextField();
    private final Label error = Parts.errorLine("signInError");
    private final Parent root;

    public SignInScreen(String examTitle, String hint, Consumer<String> onSignIn) {
        number.setId("candidateNumber");
        number.setAccessibleText("Candidate number");
        Button go = Parts.primary("signInButton", "_Sign in", () -> onSignIn.accept(number.getText().strip()));
        VBox box = new VBox(12,
                Parts.heading("Welcome"),
                Parts.text(examTitle),
                Parts.fieldLabel("Your _candidate number", number), number,
                Parts.quiet(hint),
                error, go);
        root = Parts.card("signInScreen", box);
    }

    public Parent root() {
        return root;
    }

    public void focus() {
        number.requestFocus();
    }

    public void showError(String message) {
        error.setText(message);
        error.setAccessibleText(message);
        number.selectAll();
        number.requestFocus();
    }
}
