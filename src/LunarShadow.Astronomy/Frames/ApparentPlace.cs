using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>
/// The apparent geocentric place of a body: referred to the true equator and equinox of date, corrected for light time
/// and aberration.
/// </summary>
/// <param name="RightAscension">Apparent right ascension.</param>
/// <param name="Declination">Apparent declination.</param>
/// <param name="DistanceKm">Geocentric distance, km.</param>
/// <param name="EclipticLongitude">Apparent ecliptic longitude of date (true ecliptic and equinox).</param>
/// <param name="EclipticLatitude">Apparent ecliptic latitude of date.</param>
/// <param name="SemiDiameter">Geocentric apparent semi-diameter.</param>
/// <param name="HorizontalParallax">Equatorial horizontal parallax.</param>
/// <param name="TrueEquatorialKm">The apparent direction scaled to the distance, in the true equator and equinox of date, km.</param>
public sealed record ApparentPlace(
    Angle RightAscension,
    Angle Declination,
    double DistanceKm,
    Angle EclipticLongitude,
    Angle EclipticLatitude,
    Angle SemiDiameter,
    Angle HorizontalParallax,
    CartesianVector TrueEquatorialKm);
