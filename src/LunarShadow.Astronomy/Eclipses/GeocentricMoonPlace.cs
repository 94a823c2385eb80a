using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>The Moon's apparent geocentric place of date.</summary>
/// <param name="RightAscension">Apparent right ascension.</param>
/// <param name="Declination">Apparent declination.</param>
/// <param name="DistanceKm">Geocentric distance, km.</param>
/// <param name="SemiDiameter">Geocentric semi-diameter.</param>
public sealed record GeocentricMoonPlace(Angle RightAscension, Angle Declination, double DistanceKm, Angle SemiDiameter);
