/**
 * The command-line interface (picocli commands, option mixins, exit codes). Nothing imports this package.
 */
package org.treeproof.cli;
