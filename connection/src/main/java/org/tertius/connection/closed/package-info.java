/**
 * Closed-form connection formulas between the behaviour at 0 and at infinity: the decaying family of
 * PIII(0, 0, 1, -1) (McCoy, Tracy and Wu) and its continuation, and the Bessel-function family of D6. Depends on the
 * core only (Apfloat for Gamma and Bessel functions).
 */
package org.tertius.connection.closed;
