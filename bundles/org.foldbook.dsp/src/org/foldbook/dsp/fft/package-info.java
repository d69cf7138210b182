/** Real FFTs behind Foldbook's own types; the transform library's packed layout stays inside. */
package org.foldbook.dsp.fft;
