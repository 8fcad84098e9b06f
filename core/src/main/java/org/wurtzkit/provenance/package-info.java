/**
 * Where a result comes from. {@link org.wurtzkit.provenance.ResultProvenance} names the library
 * version ({@link org.wurtzkit.provenance.LibraryVersion}), the structure, the parameter set with the
 * content hash of its values ({@link org.wurtzkit.material.ParameterSetHash}), the solver options
 * and the warnings of a result; the solvers attach one to every {@code Solution} and write it at the
 * head of their CSV files, and the materials-data module writes and reads it as JSON.
 */
package org.wurtzkit.provenance;
