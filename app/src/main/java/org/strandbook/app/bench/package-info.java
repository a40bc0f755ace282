/**
 * {@code strandbook bench ...}: each benchmark with the floor it is measured against (the bare
 * library or arithmetic doing the same work) and the synthetic sites it builds. The product never
 * calls into this package; floors may use JDBC and the spreadsheet library directly, because being
 * the bare library is what makes them floors.
 */
package org.strandbook.app.bench;
