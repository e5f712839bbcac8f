/**
 * Hard partitions of items into clusters and contingency tables between two partitions. Imports only the JDK.
 */
package org.treeproof.partition;
