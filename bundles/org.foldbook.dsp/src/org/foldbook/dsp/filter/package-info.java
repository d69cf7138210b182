/** Models of analog anti-alias filters, digitizer digital filters and camera exposure. */
package org.foldbook.dsp.filter;
