/**
 * Path selection through a field of poles (after Fornberg and Weideman): where the next Taylor-Pade step goes.
 *
 * <p>May depend on: {@code number}, {@code step}.
 */
package org.tertius.core.path;
