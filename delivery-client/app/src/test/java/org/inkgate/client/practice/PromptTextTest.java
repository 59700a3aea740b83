package org.inkgate.client.practice;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.inkgate.client.practice.PromptText.Block;
import org.inkgate.client.practice.PromptText.Kind;
import org.junit.jupiter.api.Test;

class PromptTextTest {

    @Test
    void parse_headingParagraphAndList_givesBlocksInOrder() {
        PromptText text = PromptText.parse("# Title\n\nFirst line\nsame paragraph.\n\n- one\n- two **bold**\n");
        assertEquals(List.of(
                new Block(Kind.HEADING, "Title"),
                new Block(Kind.PARAGRAPH, "First line same paragraph."),
                new Block(Kind.LIST_ITEM, "one"),
                new Block(Kind.LIST_ITEM, "two bold")), text.blocks());
    }

    @Test
    void parse_htmlComment_isLeftOut() {
        PromptText text = PromptText.parse("<!-- note for authors\nover two lines -->\nVisible text.");
        assertEquals(List.of(new Block(Kind.PARAGRAPH, "Visible text.")), text.blocks());
    }

    @Test
    void parse_inlineMarks_areDroppedButTheirTextKept() {
        PromptText text = PromptText.parse("Write *about* __this__, see [the guide](http://example.invalid) and `code`.");
        assertEquals("Write about this, see the guide and code.", text.blocks().getFirst().text());
    }

    @Test
    void parse_lineRightAfterListItem_continuesTheItem() {
        PromptText text = PromptText.parse("- first part\n  second part\n\nAfter.");
        assertEquals(List.of(new Block(Kind.LIST_ITEM, "first part second part"), new Block(Kind.PARAGRAPH, "After.")),
                text.blocks());
    }

    @Test
    void plainText_listItems_areMarkedWithDashes() {
        assertEquals("Intro\n- a\n- b", PromptText.parse("Intro\n\n* a\n1. b").plainText());
    }
}
