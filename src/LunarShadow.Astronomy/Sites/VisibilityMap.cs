using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Sites;

/// <summary>A latitude–longitude box, degrees.</summary>
/// <param name="South">Southern edge.</param>
/// <param name="North">Northern edge.</param>
/// <param name="West">Western edge.</param>
/// <param name="East">Eastern edge.</param>
public readonly record struct GeoBox(double South, double North, double West, double East);

/// <summary>A named region of the Earth, as boxes of the map's grid.</summary>
/// <param name="Name">P1…P4, greatest, whole-eclipse or whole-totality.</param>
/// <param name="Tt">The instant, for a contact; null for the combined regions.</param>
/// <param name="Boxes">Grid cells, merged along each row of latitude.</param>
public sealed record VisibilityRegion(string Name, TtInstant? Tt, IReadOnlyList<GeoBox> Boxes);

/// <summary>
/// Where on Earth the Moon stands above the horizon at each contact, and where the whole eclipse and the whole totality
/// can be seen: evaluated at the centre of every cell of a 1° grid on a spherical Earth at sea level, by the same rising
/// criterion as the site computations (upper limb at the horizon, standard refraction 34′). Cells are merged along
/// rows of latitude into boxes.
/// </summary>
public static class VisibilityMap
{
    /// <summary>Grid resolution, degrees.</summary>
    public const double ResolutionDegrees = 1.0;

    // Common practice (Meeus 1998, ch. 15): the Moon's upper limb is on the horizon when its geocentric altitude is
    // π − s − R₀ (parallax, semi-diameter, refraction at the horizon in standard air: the library's own, about 34′).
    private static readonly double StandardRefraction = AtmosphericRefraction.FromApparentAltitude(Angle.Zero, AirConditions.Standard).Radians;

    /// <summary>The regions of an eclipse; UT1 = TT − ΔT places the Earth's rotation.</summary>
    public static IReadOnlyList<VisibilityRegion> Compute(LunarEclipse eclipse, double deltaTSeconds)
    {
        var night = eclipse.NightSky;
        var instants = eclipse.Moments.Select(m => (Name: m.Label, m.Tt)).ToList();
        var grids = instants.ToDictionary(i => i.Name, i => Grid(night, i.Tt, deltaTSeconds));
        var regions = instants.Select(i => new VisibilityRegion(i.Name, i.Tt, Boxes(grids[i.Name]))).ToList();
        regions.Add(new VisibilityRegion("whole-eclipse", null, Boxes(And(grids["P1"], grids["P4"]))));
        if (grids.TryGetValue("U2", out var u2)) regions.Add(new VisibilityRegion("whole-totality", null, Boxes(And(u2, grids["U3"]))));
        return regions;
    }

    private static bool[,] Grid(EclipseNightSky night, TtInstant tt, double deltaTSeconds)
    {
        var hours = night.HoursFromCenter(tt);
        var moon = night.MoonKm(hours);
        var gast = night.SiderealTime(tt, new Ut1Instant(tt.JulianDate.PlusSeconds(-deltaTSeconds)));
        var earthFixed = (RotationMatrix.AboutZ(gast.Radians) * moon);
        var distance = earthFixed.Length;
        var direction = earthFixed / distance;
        var parallax = BodyDisc.HorizontalParallax(distance).Radians;
        var semiDiameter = BodyDisc.MoonSemiDiameter(distance).Radians;
        var threshold = Math.Sin(parallax - semiDiameter - StandardRefraction);
        var rows = (int)(180 / ResolutionDegrees);
        var columns = (int)(360 / ResolutionDegrees);
        var grid = new bool[rows, columns];
        for (var i = 0; i < rows; i++)
        {
            var (sinLat, cosLat) = Math.SinCos((-90 + (i + 0.5) * ResolutionDegrees) * Math.PI / 180);
            for (var j = 0; j < columns; j++)
            {
                var (sinLon, cosLon) = Math.SinCos((-180 + (j + 0.5) * ResolutionDegrees) * Math.PI / 180);
                grid[i, j] = cosLat * cosLon * direction.X + cosLat * sinLon * direction.Y + sinLat * direction.Z >= threshold;
            }
        }
        return grid;
    }

    private static bool[,] And(bool[,] a, bool[,] b)
    {
        var result = new bool[a.GetLength(0), a.GetLength(1)];
        for (var i = 0; i < a.GetLength(0); i++)
            for (var j = 0; j < a.GetLength(1); j++)
                result[i, j] = a[i, j] && b[i, j];
        return result;
    }

    private static List<GeoBox> Boxes(bool[,] grid)
    {
        var boxes = new List<GeoBox>();
        for (var i = 0; i < grid.GetLength(0); i++)
        {
            var south = -90 + i * ResolutionDegrees;
            var j = 0;
            while (j < grid.GetLength(1))
            {
                if (!grid[i, j])
                {
                    j++;
                    continue;
                }
                var start = j;
                while (j < grid.GetLength(1) && grid[i, j]) j++;
                boxes.Add(new GeoBox(south, south + ResolutionDegrees, -180 + start * ResolutionDegrees, -180 + j * ResolutionDegrees));
            }
        }
        return boxes;
    }
}
