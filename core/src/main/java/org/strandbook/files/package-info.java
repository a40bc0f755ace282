/**
 * How Strandbook puts the files it writes into place ({@link org.strandbook.files.FileReplacement}).
 */
package org.strandbook.files;
