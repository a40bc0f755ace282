/**
 * The workbook file: one SQLite database per site, holding the site, its catalogs, measurement
 * points, light paths, scans (spectra as little-endian binary64 BLOBs), inspections, sign-offs,
 * notes and an audit trail of every change.
 *
 * <p>Entry point: {@link org.strandbook.store.Workbook#create} and {@link org.strandbook.store.Workbook#open},
 * which hand out small repositories with explicit SQL. What the file promises:
 * <ul>
 *   <li>Nothing half-written: each repository call is one transaction (several calls join one with
 *       {@link org.strandbook.store.Workbook#inTransaction(Runnable)}); a killed program leaves every
 *       change wholly present or absent. Foreign keys are enforced on every connection.</li>
 *   <li>Several programs may open one workbook: readers never wait (write-ahead log); a writer waits
 *       up to the busy timeout for another, then gets {@link org.strandbook.store.WorkbookBusyException}.</li>
 *   <li>Foreign files are recognised by their header before SQLite touches them
 *       ({@link org.strandbook.store.NotAWorkbookException}); a file of a newer schema is refused
 *       ({@link org.strandbook.store.NewerWorkbookException}); an older one is upgraded step by step,
 *       each step one transaction, and the upgrade is itself audited.</li>
 *   <li>Who changed what: every insert, update and delete appends a hash-chained row to
 *       {@link org.strandbook.store.AuditLog}; {@link org.strandbook.store.AuditLog#verify()} also finds
 *       rows changed by other programs.</li>
 * </ul>
 * Keep a workbook on a local disk or USB stick, not on a network share: SQLite's write-ahead log
 * needs shared memory between the programs using it, which network file systems do not provide.
 */
package org.strandbook.store;
