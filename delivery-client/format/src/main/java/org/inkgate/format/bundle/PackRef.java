package org.inkgate.format.bundle;

/**
 * A resource pack embedded in the bundle.
 *
 * @param id      pack id that policies name
 * @param kind    glossary or dictionary
 * @param version pack version
 * @param file    bundle entry holding the pack file
 * @param sha256  SHA-256 of the pack file (hex), so a task's exact data can be named
 */
public record PackRef(String id, String kind, String version, String file, String sha256) {
}
