/**
 * Maintenance and handover as a person reads them: a point's history in time order (scans,
 * inspections, actions, notes, signatures) and the standing of signatures.
 */
package org.strandbook.handover;
