/**
 * The settings of a study, the study runner, the immutable evidence records it produces and the recommendation drawn from them.
 */
package org.treeproof.study;
