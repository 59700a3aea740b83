package org.inkgate.client.task;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import javafx.animation.PauseTransition;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Hyperlink;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.dictionary.DictionaryEntry;
import org.inkgate.packs.dictionary.LemmaLink;
import org.inkgate.packs.dictionary.Lookup;
import org.inkgate.packs.dictionary.Sense;
import org.inkgate.packs.event.Timed;
import org.inkgate.packs.policy.Tool;

/**
 * The dictionary page: look a word up as you type, the way the glossary searches (after the same
 * typing pause, {@link GlossaryPage#SEARCH_AFTER}, so each logged lookup is a word the candidate
 * stopped at; Enter looks up at once), pick an entry to read its senses with definitions, examples and synonyms; near spellings when
 * nothing matched; insertion of the word or a synonym only when the policy allows it.
 */
final class DictionaryPage implements ToolPage {

    private final Dictionary dictionary;
    private final TaskEvents events;
    private final PanelActions actions;
    private final Lookups.Channel searches;
    private final Lookups.Channel entries;
    private final TextField query = new TextField();
    private final Label status = ToolPage.wrapped("", "panel-status");
    private final FlowPane nearSpellings = new FlowPane(8, 4);
    private final ListView<DictionaryEntry> results = new ListView<>();
    private final VBox entryView = new VBox(10);
    private final InsertRow insertRow;
    private final PauseTransition typingPause = new PauseTransition(GlossaryPage.SEARCH_AFTER);
    /** True while the page itself fills the box (the word at the caret): that is not a lookup the candidate asked for. */
    private boolean filling;
    private final VBox root;

    DictionaryPage(Dictionary dictionary, TaskEvents events, PanelActions actions, Lookups lookups) {
        this.dictionary = dictionary;
        this.events = events;
        this.actions = actions;
        this.searches = lookups.channel(this::failed);
        this.entries = lookups.channel(this::failed);

        query.setId("dictionaryQuery");
        query.setPromptText("A word to look up");
        query.setAccessibleText("Word to look up in the dictionary");
        typingPause.setOnFinished(e -> lookUp(query.getText()));
        query.textProperty().addListener((o, was, now) -> {
            if (!filling) {
                typingPause.playFromStart();
            }
        });
        query.setOnAction(e -> {
            typingPause.stop();
            lookUp(query.getText());
        });
        Button go = new Button("Look up");
        go.setId("dictionaryLookUp");
        go.setOnAction(e -> {
            typingPause.stop();
            lookUp(query.getText());
        });
        go.setMinWidth(Region.USE_PREF_SIZE); // never shortened to "..." in large print
        HBox.setHgrow(query, Priority.ALWAYS);
        HBox search = new HBox(8, query, go);
        search.setAlignment(Pos.CENTER_LEFT);

        status.setId("dictionaryStatus");
        nearSpellings.setId("dictionaryNear");
        results.setId("dictionaryResults");
        results.setAccessibleText("Dictionary entries found");
        WrappedRows.show(results, item -> item.lemma() + "  (" + item.partOfSpeech().label() + ", "
                + item.senses().size() + (item.senses().size() == 1 ? " sense)" : " senses)"));
        // opening an entry is a deliberate act (click or Enter), so arrowing through the list logs nothing
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

        entryView.setId("dictionaryEntry");
        entryView.getStyleClass().add("entry-view");
        ScrollPane entryScroll = new ScrollPane(entryView);
        entryScroll.setFitToWidth(true);
        entryScroll.getStyleClass().add("entry-scroll");
        VBox.setVgrow(entryScroll, Priority.ALWAYS);

        root = new VBox(10, search, status, nearSpellings, results, entryScroll);
        root.getStyleClass().add("tool-page");
        insertRow = new InsertRow(Tool.DICTIONARY, actions, "dictionary", "word");
        if (actions.insertAllowed()) {
            root.getChildren().add(insertRow.node());
        }
    }

    @Override
    public Tool tool() {
        return Tool.DICTIONARY;
    }

    @Override
    public String title() {
        return "_Dictionary";
    }

    @Override
    public Node content() {
        return root;
    }

    @Override
    public void focusStart() {
        if (query.getText().isBlank()) {
            filling = true;
            try {
                query.setText(actions.wordAtCaret());
            } finally {
                filling = false;
            }
        }
        query.requestFocus();
        query.selectAll();
    }

    void lookUp(String word) {
        if (actions.frozen().get()) {
            return;
        }
        if (word == null || word.isBlank()) {
            searches.cancel();
            return;
        }
        status.setText("Looking up \u201C" + word.strip() + "\u201D\u2026");
        searches.submit(() -> dictionary.lookup(word),
                timed -> events.tool(timed.event()),
                timed -> showLookup(timed.value()));
    }

    private void showLookup(Lookup lookup) {
        if (actions.frozen().get()) {
            return;
        }
        results.getItems().setAll(lookup.entries());
        nearSpellings.getChildren().clear();
        entryView.getChildren().clear();
        insertRow.clear();
        if (lookup.entries().isEmpty()) {
            status.setText(lookup.suggestions().isEmpty()
                    ? "No entry for \u201C" + lookup.query() + "\u201D."
                    : "No entry for \u201C" + lookup.query() + "\u201D. Entries with a similar spelling:");
            for (String s : lookup.suggestions()) {
                Hyperlink link = new Hyperlink(s);
                link.setOnAction(e -> {
                    query.setText(s);
                    lookUp(s);
                });
                nearSpellings.getChildren().add(link);
            }
        } else {
            int n = lookup.entries().size();
            status.setText(n + (n == 1 ? " entry" : " entries") + " for \u201C" + lookup.query() + "\u201D. Choose one to read it.");
            results.getSelectionModel().selectFirst();
        }
    }

    void openSelected() {
        DictionaryEntry chosen = results.getSelectionModel().getSelectedItem();
        if (chosen == null || actions.frozen().get()) {
            return;
        }
        String id = chosen.id();
        entries.submit(() -> dictionary.openEntry(id),
                timed -> events.tool(timed.event()),
                this::showEntry);
    }

    private void showEntry(Timed<Optional<DictionaryEntry>> timed) {
        if (actions.frozen().get() || timed.value().isEmpty()) {
            return;
        }
        DictionaryEntry e = timed.value().get();
        entryView.getChildren().setAll(ToolPage.wrapped(e.lemma() + " \u00B7 " + e.partOfSpeech().label(), "entry-heading"));
        Set<String> words = new LinkedHashSet<>();
        words.add(e.lemma());
        for (Sense s : e.senses()) {
            VBox sense = new VBox(3);
            sense.getStyleClass().add("entry-sense");
            sense.getChildren().add(ToolPage.wrapped(s.number() + ". " + s.gloss(), "entry-definition"));
            for (String ex : s.examples()) {
                sense.getChildren().add(ToolPage.wrapped("\u201C" + ex + "\u201D", "entry-example"));
            }
            if (!s.synonyms().isEmpty()) {
                sense.getChildren().add(ToolPage.wrapped("Synonyms: " + String.join(", ", s.synonyms()), "entry-related"));
                words.addAll(s.synonyms());
            }
            List<String> links = new ArrayList<>();
            for (LemmaLink l : s.links()) {
                if (l.kind() == LemmaLink.Kind.ANTONYM) {
                    links.add(l.lemma());
                }
            }
            if (!links.isEmpty()) {
                sense.getChildren().add(ToolPage.wrapped("Opposite: " + String.join(", ", links), "entry-related"));
            }
            entryView.getChildren().add(sense);
        }
        insertRow.show(e.id(), words);
    }

    private void failed(RuntimeException e) {
        status.setText("The dictionary could not answer (" + e.getMessage() + "). Your answer is not affected; tell the invigilator.");
    }

    ListView<DictionaryEntry> results() {
        return results;
    }
}
