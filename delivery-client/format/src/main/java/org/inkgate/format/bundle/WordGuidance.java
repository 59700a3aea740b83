package org.inkgate.format.bundle;

/**
 * Soft word limits: the candidate is told, never stopped.
 *
 * @param min suggested minimum, 0 for none
 * @param max suggested maximum, 0 for none
 */
public record WordGuidance(int min, int max) {
}
