/**
 * The standalone EMF code generator of Penduline: reads a genmodel and writes the model code,
 * outside Eclipse, so that CI can regenerate and compare with the checked-in {@code src-gen}.
 * Start from {@link dev.penduline.codegen.ModelCodeGenerator}; the usual entry is
 * {@code releng/scripts/regenerate-model.sh}. Trap: the generator's adapter-factory registry
 * must be given the GenModel descriptor, or generation succeeds while writing nothing.
 */
package dev.penduline.codegen;
