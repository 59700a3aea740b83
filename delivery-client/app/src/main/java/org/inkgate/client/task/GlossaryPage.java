package org.inkgate.client.task;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import javafx.animation.PauseTransition;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.Duration;
import org.inkgate.packs.event.Timed;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.glossary.GlossaryEntry;
import org.inkgate.packs.glossary.GlossaryHit;
import org.inkgate.packs.glossary.GlossaryTerm;
import org.inkgate.packs.glossary.LanguageSection;
import org.inkgate.packs.policy.Tool;

/**
 * The glossary page: search as you type across every language of the term bank, results with
 * their equivalents in the other languages, the whole bilingual entry on choosing one, and
 * insertion of a term only when the policy allows it.
 */
final class GlossaryPage implements ToolPage {

    /** Typing pause before a search runs, so each logged query is a word the candidate stopped at (common practice). */
    static final Duration SEARCH_AFTER = Duration.millis(250);
    private static final int LIMIT = 20;

    private final Glossary glossary;
    private final TaskEvents events;
    private final PanelActions actions;
    private final Lookups.Channel searches;
    private final Lookups.Channel entries;
    private final TextField query = new TextField();
    private final Label status = ToolPage.wrapped("", "panel-status");
    private final ListView<GlossaryHit> results = new ListView<>();
    private final VBox entryView = new VBox(10);
    private final InsertRow insertRow;
    private final PauseTransition typingPause = new PauseTransition(SEARCH_AFTER);
    private final VBox root;

    GlossaryPage(Glossary glossary, TaskEvents events, PanelActions actions, Lookups lookups) {
        this.glossary = glossary;
        this.events = events;
        this.actions = actions;
        this.searches = lookups.channel(this::failed);
        this.entries = lookups.channel(this::failed);

        query.setId("glossaryQuery");
        query.setPromptText("Type a term, in any language of the glossary");
        query.setAccessibleText("Search the glossary");
        typingPause.setOnFinished(e -> search(query.getText()));
        query.textProperty().addListener((o, was, now) -> typingPause.playFromStart());
        query.setOnAction(e -> {
            typingPause.stop();
            search(query.getText());
        });

        status.setId("glossaryStatus");
        results.setId("glossaryResults");
        results.setAccessibleText("Glossary terms found");
        WrappedRows.show(results, GlossaryPage::describe);
        results.setOnMouseClicked(e -> {
            if (e.getButton() == MouseButton.PRIMARY) {
                openSelected();
            }
        });
        results.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER) {
                openSelected();
                e.consume();
            }
        });

        entryView.setId("glossaryEntry");
        entryView.getStyleClass().add("entry-view");
        ScrollPane entryScroll = new ScrollPane(entryView);
        entryScroll.setFitToWidth(true);
        entryScroll.getStyleClass().add("entry-scroll");
        VBox.setVgrow(entryScroll, Priority.ALWAYS);

        root = new VBox(10, query, status, results, entryScroll);
        root.getStyleClass().add("tool-page");
        insertRow = new InsertRow(Tool.GLOSSARY, actions, "glossary", "term");
        if (actions.insertAllowed()) {
            root.getChildren().add(insertRow.node());
        }
    }

    static String describe(GlossaryHit hit) {
        StringBuilder b = new StringBuilder(hit.term()).append(" [").append(hit.language()).append(']');
        for (GlossaryHit.Equivalent e : hit.equivalents()) {
            b.append("  \u2192 ").append(e.term()).append(" [").append(e.language()).append(']');
        }
        return b.toString();
    }

    @Override
    public Tool tool() {
        return Tool.GLOSSARY;
    }

    @Override
    public String title() {
        return "_Glossary";
    }

    @Override
    public Node content() {
        return root;
    }

    @Override
    public void focusStart() {
        query.requestFocus();
        query.selectAll();
    }

    void search(String text) {
        if (actions.frozen().get()) {
            return;
        }
        if (text == null || text.isBlank()) {
            searches.cancel();
            results.getItems().clear();
            status.setText("");
            return;
        }
        searches.submit(() -> glossary.search(text, LIMIT),
                timed -> events.tool(timed.event()),
                timed -> showHits(text.strip(), timed.value()));
    }

    private void showHits(String asked, List<GlossaryHit> hits) {
        if (actions.frozen().get()) {
            return;
        }
        results.getItems().setAll(hits);
        if (hits.isEmpty()) {
            status.setText("No term matches \u201C" + asked + "\u201D.");
        } else {
            boolean fuzzy = hits.get(0).match() == org.inkgate.packs.glossary.MatchKind.FUZZY;
            status.setText(hits.size() + (hits.size() == 1 ? " term" : " terms")
                    + (fuzzy ? " with a similar spelling" : "") + ". Choose one to read the entry.");
            results.getSelectionModel().selectFirst();
        }
    }

    void openSelected() {
        GlossaryHit chosen = results.getSelectionModel().getSelectedItem();
        if (chosen == null || actions.frozen().get()) {
            return;
        }
        String id = chosen.entryId();
        entries.submit(() -> glossary.openEntry(id),
                timed -> events.tool(timed.event()),
                this::showEntry);
    }

    private void showEntry(Timed<Optional<GlossaryEntry>> timed) {
        if (actions.frozen().get() || timed.value().isEmpty()) {
            return;
        }
        GlossaryEntry e = timed.value().get();
        entryView.getChildren().clear();
        if (e.subjectField() != null) {
            entryView.getChildren().add(ToolPage.wrapped("Subject: " + e.subjectField(), "entry-related"));
        }
        Set<String> terms = new LinkedHashSet<>();
        for (LanguageSection section : e.languages()) {
            VBox side = new VBox(3);
            side.getStyleClass().add("entry-sense");
            StringBuilder heading = new StringBuilder();
            for (GlossaryTerm t : section.terms()) {
                heading.append(heading.isEmpty() ? "" : "; ").append(t.text());
                if (t.partOfSpeech() != null) {
                    heading.append(" (").append(t.partOfSpeech()).append(')');
                }
                terms.add(t.text());
            }
            side.getChildren().add(ToolPage.wrapped("[" + section.language() + "] " + heading, "entry-heading"));
            if (section.definition() != null) {
                side.getChildren().add(ToolPage.wrapped(section.definition(), "entry-definition"));
            }
            for (GlossaryTerm t : section.terms()) {
                if (t.context() != null) {
                    side.getChildren().add(ToolPage.wrapped("\u201C" + t.context() + "\u201D", "entry-example"));
                }
            }
            for (String note : section.notes()) {
                side.getChildren().add(ToolPage.wrapped("Note: " + note, "entry-related"));
            }
            entryView.getChildren().add(side);
        }
        for (String note : e.notes()) {
            entryView.getChildren().add(ToolPage.wrapped("Note: " + note, "entry-related"));
        }
        insertRow.show(e.id(), terms);
    }

    private void failed(RuntimeException e) {
        status.setText("The glossary could not answer (" + e.getMessage() + "). Your answer is not affected; tell the invigilator.");
    }

    ListView<GlossaryHit> results() {
        return results;
    }
}
