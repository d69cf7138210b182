/** Digitizer figures: quantisation noise, required attenuation, alias-free band of a chain. */
package org.foldbook.dsp.digitizer;
