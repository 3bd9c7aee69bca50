/**
 * The small grid value type the numeric kernels share. Depends on nothing but the JDK.
 */
package org.halyard.grid;
