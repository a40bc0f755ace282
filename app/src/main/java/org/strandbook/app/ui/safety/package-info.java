/** Safety cautions shown before light is switched on or a measurement is recorded in a hazardous area. */
package org.strandbook.app.ui.safety;
