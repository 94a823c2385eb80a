using LunarShadow.Astronomy.Sites;
using NetTopologySuite.Algorithm;
using NetTopologySuite.Geometries;
using NetTopologySuite.Operation.Union;
using NetTopologySuite.Simplify;

namespace LunarShadow.Api.Eclipses;

/// <summary>
/// Turns a region's grid cells into smooth outlines: the cells are merged (NetTopologySuite's cascaded union) and each
/// ring is simplified with Douglas–Peucker (Douglas and Peucker 1973) to within a fraction of a cell, so the 1° staircase
/// becomes a straight-sided outline. Vertices on the antimeridian and on the poles are kept, so the pieces of a region
/// split at ±180° still meet there exactly (RFC 7946 §3.1.9). Exterior rings are counterclockwise, holes clockwise (§3.1.6).
/// </summary>
internal static class VisibilityOutlines
{
    private static readonly GeometryFactory Factory = new();

    /// <summary>How far a simplified outline may stray from the cell edges, in cells (common practice: under one cell).</summary>
    public const double ToleranceCells = 0.75;

    /// <summary>The region as RFC 7946 MultiPolygon coordinates: polygons of rings of [longitude, latitude].</summary>
    public static List<double[][][]> Outline(IReadOnlyList<GeoBox> boxes, double resolutionDegrees)
    {
        if (boxes.Count == 0) return [];
        var cells = boxes.Select(b => (Geometry)Factory.ToGeometry(new Envelope(b.West, b.East, b.South, b.North))).ToList();
        var merged = CascadedPolygonUnion.Union(cells);
        var tolerance = ToleranceCells * resolutionDegrees;
        var result = new List<double[][][]>();
        for (var i = 0; i < merged.NumGeometries; i++)
        {
            if (merged.GetGeometryN(i) is not Polygon polygon) continue;
            var shell = Simplify(polygon.Shell.Coordinates, tolerance);
            var holes = polygon.Holes.Select(h => Simplify(h.Coordinates, tolerance)).Where(h => h.Length >= 4).ToArray();
            var simplified = Factory.CreatePolygon(Factory.CreateLinearRing(shell), holes.Select(h => Factory.CreateLinearRing(h)).ToArray());
            // A simplification that broke the polygon (rare, with narrow necks) falls back to the exact cell outline.
            var chosen = simplified.IsValid ? simplified : polygon;
            result.Add(Rings(chosen));
        }
        return result;
    }

    // A vertex on ±180° longitude or ±90° latitude is pinned; the runs between pinned vertices are simplified as lines.
    private static Coordinate[] Simplify(Coordinate[] ring, double tolerance)
    {
        var open = ring.Take(ring.Length - 1).ToList();
        var pinned = Enumerable.Range(0, open.Count).Where(i => Math.Abs(open[i].X) == 180 || Math.Abs(open[i].Y) == 90).ToList();
        if (pinned.Count < 2)
        {
            var far = Enumerable.Range(0, open.Count).MaxBy(i => open[i].Distance(open[0]));
            pinned = far == 0 ? [0] : [0, far];
            if (pinned.Count < 2) return ring;
        }
        var output = new List<Coordinate>();
        for (var k = 0; k < pinned.Count; k++)
        {
            var from = pinned[k];
            var to = pinned[(k + 1) % pinned.Count];
            var run = new List<Coordinate>();
            for (var i = from; ; i = (i + 1) % open.Count)
            {
                run.Add(open[i]);
                if (i == to && run.Count > 1) break;
            }
            var kept = DouglasPeuckerLineSimplifier.Simplify(run.ToArray(), tolerance);
            output.AddRange(kept.Take(kept.Length - 1));
        }
        output.Add(output[0]);
        return output.Count >= 4 ? output.ToArray() : ring;
    }

    private static double[][][] Rings(Polygon polygon)
    {
        var shell = polygon.Shell.Coordinates;
        if (!Orientation.IsCCW(shell)) shell = shell.Reverse().ToArray();
        var rings = new List<double[][]> { shell.Select(c => new[] { c.X, c.Y }).ToArray() };
        foreach (var hole in polygon.Holes)
        {
            var h = hole.Coordinates;
            if (Orientation.IsCCW(h)) h = h.Reverse().ToArray();
            rings.Add(h.Select(c => new[] { c.X, c.Y }).ToArray());
        }
        return rings.ToArray();
    }
}
