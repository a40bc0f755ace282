/** The workbook's component catalogs (fiber, connector and probe types) as sheets. */
package org.strandbook.app.ui.catalog;
