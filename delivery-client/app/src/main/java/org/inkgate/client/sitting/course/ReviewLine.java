package org.inkgate.client.sitting.course;

/** One task on the review screen: its title, the words written, and the form's word guidance (null: none). */
public record ReviewLine(String title, int words, String guidance) {
}
