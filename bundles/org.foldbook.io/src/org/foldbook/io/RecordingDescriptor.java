package org.foldbook.io;

/**
 * What the notebook knows about a recording beyond its bytes: the raw layout, delimited-text settings or
 * the HDF5 dataset to read. Implemented by {@link org.foldbook.io.raw.RawLayout},
 * {@link org.foldbook.io.csv.DelimitedTextSettings} and {@link org.foldbook.io.hdf5.Hdf5Selection}.
 */
public interface RecordingDescriptor {
}
