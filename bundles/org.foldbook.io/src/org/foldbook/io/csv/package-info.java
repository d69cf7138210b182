/** CSV/TSV readers with header, unit and time-column detection. */
package org.foldbook.io.csv;
