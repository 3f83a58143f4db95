/**
 * Expansions of Painleve III solutions at z = 0 on the universal cover: the power solutions on the strip
 * |Re sigma| &lt;= 1 including the edges where zeros or poles accumulate ({@link
 * org.tertius.connection.zero.StripSeriesAtZero}, {@link org.tertius.connection.zero.PowerSeriesAtZero}), the
 * logarithmic ones at sigma = +-1 ({@link org.tertius.connection.zero.LogSeriesAtZero}), their common front
 * {@link org.tertius.connection.zero.ZeroExpansion}, start data, and the result type
 * {@link org.tertius.connection.zero.ZeroBehaviour}. Depends on the core ({@code number}, {@code piii},
 * {@code step}) and on {@code closed} for the decaying family's logarithmic constant.
 */
package org.tertius.connection.zero;
