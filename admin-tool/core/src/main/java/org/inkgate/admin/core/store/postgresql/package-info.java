/**
 * The PostgreSQL stores: the central results store that several admin machines collect into at
 * once. Only the opening (connection, credentials, plain error words) and the dialect live here;
 * the SQL and the schema are the shared ones in {@code store.sql}.
 */
package org.inkgate.admin.core.store.postgresql;
