using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>The Sun and Moon as seen from the Earth's centre at one instant, with the frame quantities used.</summary>
/// <param name="Tt">The instant in TT.</param>
/// <param name="Ut1">The same instant in UT1.</param>
/// <param name="Moon">The Moon's apparent place.</param>
/// <param name="Sun">The Sun's apparent place.</param>
/// <param name="Nutation">Nutation (IAU 2000B).</param>
/// <param name="MeanObliquity">Mean obliquity of date.</param>
/// <param name="GreenwichApparentSiderealTime">Greenwich apparent sidereal time.</param>
public sealed record GeocentricSky(
    TtInstant Tt,
    Ut1Instant Ut1,
    ApparentPlace Moon,
    ApparentPlace Sun,
    Nutation Nutation,
    Angle MeanObliquity,
    Angle GreenwichApparentSiderealTime)
{
    /// <summary>True obliquity of date.</summary>
    public Angle TrueObliquity => MeanObliquity + Nutation.InObliquity;
}
