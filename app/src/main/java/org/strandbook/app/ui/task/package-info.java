/**
 * Background work for the window: every long action (loading, saving, importing, evaluating) goes
 * through a {@link org.strandbook.app.ui.task.TaskExecutor}, which reports progress and can be
 * cancelled, so the FX thread never waits on the workbook file.
 */
package org.strandbook.app.ui.task;
