/** HDF5 dataset readers. */
package org.foldbook.io.hdf5;
