namespace LunarShadow.Api.Ephemeris;

/// <summary>Apparent places of the Moon and Sun at one instant.</summary>
/// <param name="Utc">The instant, ISO 8601 UTC.</param>
/// <param name="Tt">The same instant in Terrestrial Time, ISO 8601 without zone (TT).</param>
/// <param name="JulianDateTt">Julian date in TT.</param>
/// <param name="DeltaTSeconds">ΔT = TT − UT1 used, seconds.</param>
/// <param name="DeltaTUncertaintySeconds">One-sigma uncertainty of ΔT, seconds.</param>
/// <param name="DeltaTModel">Name of the ΔT model (or "fixed").</param>
/// <param name="Frame">What the geocentric coordinates refer to.</param>
/// <param name="Moon">The Moon.</param>
/// <param name="Sun">The Sun.</param>
/// <param name="DataVersion">Version tag of the embedded ephemeris data.</param>
public sealed record EphemerisResponse(
    string Utc,
    string Tt,
    double JulianDateTt,
    double DeltaTSeconds,
    double DeltaTUncertaintySeconds,
    string DeltaTModel,
    string Frame,
    BodyPlace Moon,
    BodyPlace Sun,
    string DataVersion);

/// <summary>A body's apparent geocentric place of date, and its topocentric place when a site was given.</summary>
/// <param name="RightAscensionHours">Apparent right ascension, hours.</param>
/// <param name="DeclinationDegrees">Apparent declination, degrees.</param>
/// <param name="DistanceKm">Geocentric distance, km.</param>
/// <param name="DistanceAu">Geocentric distance in astronomical units (Sun only).</param>
/// <param name="EclipticLongitudeDegrees">Apparent ecliptic longitude of date, degrees.</param>
/// <param name="EclipticLatitudeDegrees">Apparent ecliptic latitude of date, degrees.</param>
/// <param name="SemiDiameterArcsec">Geocentric semi-diameter, arc-seconds.</param>
/// <param name="HorizontalParallaxArcsec">Equatorial horizontal parallax, arc-seconds.</param>
/// <param name="Topocentric">Place seen from the site, or null without one.</param>
/// <param name="Libration">Moon only: total (optical + physical) libration, geocentric (Meeus 1998, ch. 53).</param>
/// <param name="AxisPositionAngleDegrees">Moon only: position angle of the Moon's north pole, from celestial north through east, geocentric, degrees.</param>
/// <param name="SubSolarPoint">Moon only: selenographic latitude and longitude of the sub-solar point.</param>
public sealed record BodyPlace(
    double RightAscensionHours,
    double DeclinationDegrees,
    double DistanceKm,
    double? DistanceAu,
    double EclipticLongitudeDegrees,
    double EclipticLatitudeDegrees,
    double SemiDiameterArcsec,
    double HorizontalParallaxArcsec,
    TopocentricBodyPlace? Topocentric,
    LibrationResponse? Libration = null,
    double? AxisPositionAngleDegrees = null,
    LibrationResponse? SubSolarPoint = null);

/// <summary>A selenographic point: for a libration, the point at the centre of the disc.</summary>
/// <param name="LongitudeDegrees">Selenographic longitude, east (toward Mare Crisium) positive, degrees.</param>
/// <param name="LatitudeDegrees">Selenographic latitude, north positive, degrees.</param>
public sealed record LibrationResponse(double LongitudeDegrees, double LatitudeDegrees);

/// <summary>A body seen from the site.</summary>
/// <param name="RightAscensionHours">Topocentric right ascension, hours.</param>
/// <param name="DeclinationDegrees">Topocentric declination, degrees.</param>
/// <param name="AltitudeDegrees">Altitude above the horizon including refraction, degrees.</param>
/// <param name="AirlessAltitudeDegrees">Altitude without refraction, degrees.</param>
/// <param name="AzimuthDegrees">Azimuth from north through east, degrees.</param>
/// <param name="DistanceKm">Distance from the site, km.</param>
/// <param name="SemiDiameterArcsec">Topocentric semi-diameter, arc-seconds.</param>
/// <param name="Libration">Moon only: topocentric libration (the selenographic point at the centre of the disc seen from the site).</param>
/// <param name="AxisPositionAngleDegrees">Moon only: position angle of the Moon's axis seen from the site, degrees.</param>
public sealed record TopocentricBodyPlace(
    double RightAscensionHours,
    double DeclinationDegrees,
    double AltitudeDegrees,
    double AirlessAltitudeDegrees,
    double AzimuthDegrees,
    double DistanceKm,
    double SemiDiameterArcsec,
    LibrationResponse? Libration = null,
    double? AxisPositionAngleDegrees = null);
