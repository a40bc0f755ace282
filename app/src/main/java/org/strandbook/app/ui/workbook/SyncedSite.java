package org.strandbook.app.ui.workbook;

import org.strandbook.server.SiteSync;

/**
 * What a sync from the window did, and the workbook as it stands afterwards.
 *
 * @param loaded  the workbook read again: the sync may have pulled points, paths and catalog entries
 * @param outcome the sync's counts and the conflicts left open
 */
public record SyncedSite(LoadedSite loaded, SiteSync.Outcome outcome) {
}
