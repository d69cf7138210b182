/** Raw binary readers described by a sidecar file or a notebook entry. */
package org.foldbook.io.raw;
