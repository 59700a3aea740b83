/**
 * Planning a study: power and the number of candidates for the paired, two-group and
 * repeated-measures designs (noncentral t and F from {@code analysis.distributions}), and the
 * decision study that projects a pilot's variance components onto other numbers of raters and
 * tasks. Plain numbers in, records out; no UI. The {@code plan} command of the admin app prints them.
 */
package org.inkgate.analysis.planning;
