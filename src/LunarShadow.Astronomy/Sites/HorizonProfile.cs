using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Sites;

/// <summary>
/// The local horizon — hills, trees, buildings — as altitudes at given azimuths, interpolated linearly in azimuth
/// (wrapping through north). An empty profile is a flat horizon at 0°.
/// </summary>
public sealed class HorizonProfile
{
    private readonly (double Azimuth, double Altitude)[] _points;

    /// <summary>A profile from (azimuth, altitude) points in degrees; azimuths 0–360 from north through east.</summary>
    public HorizonProfile(IEnumerable<(double AzimuthDegrees, double AltitudeDegrees)> points)
    {
        _points = points.Select(p => (((p.AzimuthDegrees % 360) + 360) % 360, p.AltitudeDegrees))
            .GroupBy(p => p.Item1).Select(g => g.First()).OrderBy(p => p.Item1).ToArray();
    }

    /// <summary>A flat horizon.</summary>
    public static HorizonProfile Flat { get; } = new([]);

    /// <summary>True when no points were given.</summary>
    public bool IsFlat => _points.Length == 0;

    /// <summary>The points, sorted by azimuth.</summary>
    public IReadOnlyList<(double Azimuth, double Altitude)> Points => _points;

    /// <summary>The horizon's altitude at an azimuth.</summary>
    public Angle AltitudeAt(Angle azimuth)
    {
        if (_points.Length == 0) return Angle.Zero;
        if (_points.Length == 1) return Angle.FromDegrees(_points[0].Altitude);
        var az = azimuth.NormalizedPositive().Degrees;
        var i = FirstAbove(az);
        var (a0, h0) = i <= 0 ? _points[^1] : _points[i - 1];
        var (a1, h1) = i < 0 ? _points[0] : _points[i];
        var span = ((a1 - a0) % 360 + 360) % 360;
        if (span == 0) return Angle.FromDegrees(h0);
        var along = ((az - a0) % 360 + 360) % 360;
        return Angle.FromDegrees(h0 + (h1 - h0) * along / span);
    }

    // The index of the first point east of the azimuth, or −1 if none: a binary search, O(log n) per lookup, since the
    // horizon search asks for hundreds of azimuths per eclipse and a profile may hold 360 points.
    private int FirstAbove(double azimuthDegrees)
    {
        int low = 0, high = _points.Length;
        while (low < high)
        {
            var middle = (low + high) >> 1;
            if (_points[middle].Azimuth > azimuthDegrees) high = middle;
            else low = middle + 1;
        }
        return low == _points.Length ? -1 : low;
    }
}
