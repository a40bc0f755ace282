/** The detail plot of a point's loss spectrum, with the axis choices remembered per user. */
package org.strandbook.app.ui.plot;
