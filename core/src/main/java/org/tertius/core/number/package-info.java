/**
 * Number types and arithmetics: points of the universal cover of the punctured plane ({@link
 * org.tertius.core.number.SurfacePoint}) and exact points, complex text, the shortest round-trip decimal of a double
 * ({@link org.tertius.core.number.ShortestDecimal}, for large tables), the arithmetic family that lets code run in
 * double and arbitrary precision alike ({@link org.tertius.core.number.Arithmetic}, {@link
 * org.tertius.core.number.AnalyticArithmetic} and their double, Apfloat, high-precision and modulus
 * implementations), and the high-precision number types ({@link org.tertius.core.number.ExactNumber}, {@link
 * org.tertius.core.number.MpComplex}, {@link org.tertius.core.number.MpContext}).
 *
 * <p>May depend on: Hipparchus, Apfloat and the core's exceptions only.
 */
package org.tertius.core.number;
