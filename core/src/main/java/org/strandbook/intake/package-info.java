/**
 * Bringing outside files into a workbook: analyzer scan files and contractors' cable schedules,
 * each validated in full before anything is written, each file stored whole or not at all.
 */
package org.strandbook.intake;
