/**
 * The numerical connection: fits of the data at 0 to computed values and the map from the data at infinity to the
 * data at 0 for the decaying family.
 *
 * <p>May depend on: core and the other connection packages.
 */
package org.tertius.connection.match;
