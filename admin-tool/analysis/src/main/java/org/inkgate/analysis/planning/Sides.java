package org.inkgate.analysis.planning;

/** Whether a t test is two-sided or one-sided (in the direction of the planned effect). */
public enum Sides {
    TWO_SIDED,
    ONE_SIDED
}
