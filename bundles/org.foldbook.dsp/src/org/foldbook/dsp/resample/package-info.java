/** Re-sampling at rational rate ratios: bare sampler, modelled filter, ideal decimator. */
package org.foldbook.dsp.resample;
