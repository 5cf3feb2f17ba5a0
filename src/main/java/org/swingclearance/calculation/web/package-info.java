/**
 * HTTP API of the calculations feature: {@code POST /api/v1/calculations/demand} and {@code …/envelope}, JSON in
 * and out in SI units, for any signed-in staff role (HTTP Basic on {@code /api/**}). Bad input answers 400 with an
 * RFC 9457 problem document listing each bad field; the controller is package-private and sees no entity.
 */
package org.swingclearance.calculation.web;
