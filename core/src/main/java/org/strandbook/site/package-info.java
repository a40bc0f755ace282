/**
 * The site as the commissioning team records it: site, analyzers, measurement points, their send
 * and return legs of cable segments and joints, the component catalogs, scans, inspections,
 * sign-offs and notes. Plain validated records; storage lives in {@code org.strandbook.store}.
 */
package org.strandbook.site;
