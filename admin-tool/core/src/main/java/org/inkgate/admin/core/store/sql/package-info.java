/**
 * The transaction and SQL layer every store implementation shares (connection, transactions with
 * retry when busy, typed row mapping, the schema version check), the results store's schema
 * ({@code Schema}) and SQL ({@code SqlResultsStore}) written once, and the {@code Dialect} each
 * database implements for what it spells its own way. Only the store
 * implementation packages use it: the GUI and the command line reach storage through the core
 * interfaces ({@code ResultsStore}, {@code RatingStore}) that {@code store.Stores} opens.
 */
package org.inkgate.admin.core.store.sql;
