package org.wurtzkit.plot;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Contour lines of a function sampled on a rectangular grid, by marching squares: in every grid
 * cell the level's crossings on the four edges are found by linear interpolation between the
 * corner values and joined by straight segments; segments that share an edge crossing are chained
 * into polylines. A cell whose two diagonal corners lie above and the other two below the level
 * (a saddle) is resolved with the mean of its four corners. Cells with a NaN corner (a failed
 * design point) are skipped, so a line ends at their border.
 *
 * <p>The result is exact for a function that is bilinear on each cell except in saddle cells, and
 * exact for a linear function everywhere.
 */
final class Contours {
    private Contours() {
    }

    /**
     * One contour line.
     *
     * @param x      x of the vertices
     * @param y      y of the vertices
     * @param closed true if the last vertex equals the first (a loop inside the grid)
     */
    record Polyline(double[] x, double[] y, boolean closed) {
        /** @return number of vertices */
        int size() {
            return x.length;
        }

        /** @return the length of the line in the units of x and y scaled by the given spans */
        double length(double xSpan, double ySpan) {
            double l = 0;
            for (int k = 1; k < x.length; k++) {
                l += Math.hypot((x[k] - x[k - 1]) / xSpan, (y[k] - y[k - 1]) / ySpan);
            }
            return l;
        }
    }

    /**
     * @param xs    grid x values, strictly increasing, at least 2
     * @param ys    grid y values, strictly increasing, at least 2
     * @param z     z[i][j] at (xs[i], ys[j]); NaN marks a missing value
     * @param level the level
     * @return the level's contour lines (empty if the level is not crossed)
     */
    static List<Polyline> at(double[] xs, double[] ys, double[][] z, double level) {
        int nx = xs.length;
        int ny = ys.length;
        if (nx < 2 || ny < 2 || z.length != nx) {
            throw new IllegalArgumentException("need a grid of at least 2 x 2 values with z[x index][y index]");
        }
        Map<Long, double[]> points = new HashMap<>();
        List<long[]> segments = new ArrayList<>();
        for (int i = 0; i + 1 < nx; i++) {
            for (int j = 0; j + 1 < ny; j++) {
                double a = z[i][j];
                double b = z[i + 1][j];
                double c = z[i + 1][j + 1];
                double d = z[i][j + 1];
                if (Double.isNaN(a) || Double.isNaN(b) || Double.isNaN(c) || Double.isNaN(d)) {
                    continue;
                }
                int index = (a >= level ? 1 : 0) | (b >= level ? 2 : 0) | (c >= level ? 4 : 0) | (d >= level ? 8 : 0);
                if (index == 0 || index == 15) {
                    continue;
                }
                // crossing points on the four edges of the cell, where they exist
                long bottom = horizontalEdge(i, j, ny);
                long top = horizontalEdge(i, j + 1, ny);
                long left = verticalEdge(i, j, ny);
                long right = verticalEdge(i + 1, j, ny);
                if ((a >= level) != (b >= level)) {
                    points.putIfAbsent(bottom, new double[] {lerp(xs[i], xs[i + 1], a, b, level), ys[j]});
                }
                if ((d >= level) != (c >= level)) {
                    points.putIfAbsent(top, new double[] {lerp(xs[i], xs[i + 1], d, c, level), ys[j + 1]});
                }
                if ((a >= level) != (d >= level)) {
                    points.putIfAbsent(left, new double[] {xs[i], lerp(ys[j], ys[j + 1], a, d, level)});
                }
                if ((b >= level) != (c >= level)) {
                    points.putIfAbsent(right, new double[] {xs[i + 1], lerp(ys[j], ys[j + 1], b, c, level)});
                }
                switch (index) {
                    case 1, 14 -> segments.add(new long[] {bottom, left});
                    case 2, 13 -> segments.add(new long[] {bottom, right});
                    case 3, 12 -> segments.add(new long[] {left, right});
                    case 4, 11 -> segments.add(new long[] {right, top});
                    case 6, 9 -> segments.add(new long[] {bottom, top});
                    case 7, 8 -> segments.add(new long[] {left, top});
                    case 5, 10 -> {
                        // saddle: a and c on one side, b and d on the other
                        boolean centreHigh = 0.25 * (a + b + c + d) >= level;
                        boolean aHigh = a >= level;
                        if (centreHigh == aHigh) {
                            // a's side connects through the centre: the lines cut off corners b and d
                            segments.add(new long[] {bottom, right});
                            segments.add(new long[] {left, top});
                        } else {
                            segments.add(new long[] {bottom, left});
                            segments.add(new long[] {right, top});
                        }
                    }
                    default -> throw new AssertionError(index);
                }
            }
        }
        return chain(points, segments);
    }

    private static long horizontalEdge(int i, int j, int ny) {
        return 2L * ((long) i * ny + j);
    }

    private static long verticalEdge(int i, int j, int ny) {
        return 2L * ((long) i * ny + j) + 1;
    }

    private static double lerp(double p0, double p1, double v0, double v1, double level) {
        double t = (level - v0) / (v1 - v0);
        return p0 + t * (p1 - p0);
    }

    private static List<Polyline> chain(Map<Long, double[]> points, List<long[]> segments) {
        Map<Long, List<Integer>> touching = new HashMap<>();
        for (int s = 0; s < segments.size(); s++) {
            for (long key : segments.get(s)) {
                touching.computeIfAbsent(key, k -> new ArrayList<>()).add(s);
            }
        }
        boolean[] used = new boolean[segments.size()];
        List<Polyline> lines = new ArrayList<>();
        // open lines start at a crossing with one segment (the grid's border or a missing cell)
        for (int s = 0; s < segments.size(); s++) {
            for (long key : segments.get(s)) {
                if (!used[s] && touching.get(key).size() == 1) {
                    lines.add(walk(key, points, segments, touching, used));
                }
            }
        }
        // what is left are closed loops
        for (int s = 0; s < segments.size(); s++) {
            if (!used[s]) {
                lines.add(walk(segments.get(s)[0], points, segments, touching, used));
            }
        }
        return lines;
    }

    private static Polyline walk(long start, Map<Long, double[]> points, List<long[]> segments,
            Map<Long, List<Integer>> touching, boolean[] used) {
        List<double[]> vertices = new ArrayList<>();
        vertices.add(points.get(start));
        long key = start;
        while (true) {
            int next = -1;
            for (int s : touching.get(key)) {
                if (!used[s]) {
                    next = s;
                    break;
                }
            }
            if (next < 0) {
                break;
            }
            used[next] = true;
            long[] seg = segments.get(next);
            key = seg[0] == key ? seg[1] : seg[0];
            vertices.add(points.get(key));
        }
        double[] x = new double[vertices.size()];
        double[] y = new double[vertices.size()];
        for (int k = 0; k < x.length; k++) {
            x[k] = vertices.get(k)[0];
            y[k] = vertices.get(k)[1];
        }
        return new Polyline(x, y, key == start && x.length > 2);
    }
}
