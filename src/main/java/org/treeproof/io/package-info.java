/**
 * Readers for data and distance tables (CSV, TSV, gzip) and writers for the JSON and CSV outputs, including atomic output directories.
 */
package org.treeproof.io;
