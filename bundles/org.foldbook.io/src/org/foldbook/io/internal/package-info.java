/**
 * Shared machinery of the readers: hashing sequential input, sample decoding, buffer checks.
 * Not exported from the bundle; subject to change.
 */
package org.foldbook.io.internal;
