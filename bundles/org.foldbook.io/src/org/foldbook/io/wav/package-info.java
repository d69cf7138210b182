/** RIFF WAVE and RF64 readers. */
package org.foldbook.io.wav;
