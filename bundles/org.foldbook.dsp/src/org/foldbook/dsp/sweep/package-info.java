/** Stepped-rate simulation: rate ladders, per-peak verdicts across rates. */
package org.foldbook.dsp.sweep;
