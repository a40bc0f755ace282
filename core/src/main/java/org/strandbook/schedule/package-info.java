/**
 * The cable schedule: the XLSX workbook an installation contractor fills in (analyzers, points,
 * bands, cable segments, bends, joints and new component types), read into a {@link
 * org.strandbook.schedule.CableSchedule} only after every rule passed.
 *
 * <p>{@link org.strandbook.schedule.CableScheduleReader} reads and checks a file and returns either
 * the schedule or every {@link org.strandbook.schedule.ScheduleProblem}, each located as
 * {@code Sheet!C7}; {@link org.strandbook.schedule.CableScheduleWriter} fills the template from a
 * schedule; {@link org.strandbook.schedule.TemplateBuilder} makes the template itself from the layout
 * in {@link org.strandbook.schedule.ScheduleSheet} and {@link org.strandbook.schedule.ScheduleColumn};
 * {@link org.strandbook.schedule.ComponentCatalog#shipped()} loads the default component types.
 *
 * <p>Cells: numbers may be number cells or text with a decimal point or comma (see {@code
 * DecimalText}); text is trimmed; blank rows are skipped; extra columns and sheets are ignored. The
 * leg rule is written on the Read me sheet and in {@code LegSheets}.
 */
package org.strandbook.schedule;
