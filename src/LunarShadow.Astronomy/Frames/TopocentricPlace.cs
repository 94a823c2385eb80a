using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>A body as seen from a place on the Earth's surface.</summary>
/// <param name="RightAscension">Topocentric apparent right ascension.</param>
/// <param name="Declination">Topocentric apparent declination.</param>
/// <param name="DistanceKm">Distance from the observer, km.</param>
/// <param name="HourAngle">Local hour angle, west positive.</param>
/// <param name="TrueAltitude">Altitude without refraction.</param>
/// <param name="ApparentAltitude">Altitude with refraction.</param>
/// <param name="Azimuth">Azimuth from north through east.</param>
/// <param name="SemiDiameter">Topocentric semi-diameter.</param>
public sealed record TopocentricPlace(
    Angle RightAscension,
    Angle Declination,
    double DistanceKm,
    Angle HourAngle,
    Angle TrueAltitude,
    Angle ApparentAltitude,
    Angle Azimuth,
    Angle SemiDiameter);
