/** Recording readers: typed blocks of samples with rate, channel names and units; never writes a file. */
package org.foldbook.io;
