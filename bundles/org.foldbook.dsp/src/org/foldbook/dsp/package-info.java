/** Foldbook's signal-processing core: plain Java, no Eclipse or SWT imports. */
package org.foldbook.dsp;
