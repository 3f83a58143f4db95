/**
 * Sweeps of one-parameter families: classification of each member, critical values, parallel resumable runs
 * and their plots.
 *
 * <p>May depend on: core and the other connection packages.
 */
package org.tertius.connection.scan;
