package org.treeproof.study;

/**
 * The heights at which a tree cut yields its number of clusters: any height in [low, high) gives the
 * same k clusters on a monotone tree; {@code chosen} is the midpoint (the cut least sensitive to small
 * changes of height), or {@code low} when the interval is empty because heights tie.
 *
 * @param low    the height of the last merge performed
 * @param high   the height of the next merge (infinite for k = 1)
 * @param chosen the height reported for the cut
 */
public record CutHeight(double low, double high, double chosen) {
    public CutHeight {
        if (Double.isNaN(low) || Double.isNaN(high) || Double.isNaN(chosen)) {
            throw new IllegalArgumentException("cut heights must be numbers");
        }
    }
}
