package org.ferromap.maps;

/**
 * A side shared by two neighbouring cells whose category differs: the map's boundary runs
 * between sample {@code a} and sample {@code b}. Neighbours are horizontal ({@code iyA == iyB},
 * {@code ixB == ixA + 1}) or vertical ({@code ixA == ixB}, {@code iyB == iyA + 1}).
 *
 * @param ixA    column of the first cell
 * @param iyA    row of the first cell
 * @param ixB    column of the second cell
 * @param iyB    row of the second cell
 * @param xA     x of the first sample, in x-axis units
 * @param yA     y of the first sample, in y-axis units
 * @param xB     x of the second sample
 * @param yB     y of the second sample
 * @param valueA the category of the first cell
 * @param valueB the category of the second cell
 */
public record BoundaryEdge(int ixA, int iyA, int ixB, int iyB, double xA, double yA, double xB, double yB,
        double valueA, double valueB) {

    /** Whether the two cells lie side by side in a row (the edge is a vertical line in a chart). */
    public boolean horizontalNeighbours() {
        return iyA == iyB;
    }
}
