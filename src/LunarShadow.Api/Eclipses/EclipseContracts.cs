namespace LunarShadow.Api.Eclipses;

/// <summary>The eclipses in a date range.</summary>
/// <param name="ShadowModel">Shadow model used: danjon, chauvenet, none or layer.</param>
/// <param name="LayerKm">Height of the opaque layer in km (layer model only).</param>
/// <param name="DeltaTModel">ΔT model used (or "fixed").</param>
/// <param name="From">First date of the range (inclusive).</param>
/// <param name="To">Last date of the range (inclusive).</param>
/// <param name="Count">Number of eclipses returned.</param>
/// <param name="Eclipses">The eclipses, in time order.</param>
/// <param name="DataVersion">Version tag of the embedded ephemeris data.</param>
public sealed record EclipseListResponse(
    string ShadowModel, double? LayerKm, string DeltaTModel, string From, string To, int Count,
    IReadOnlyList<EclipseResponse> Eclipses, string DataVersion);

/// <summary>The global circumstances of one lunar eclipse.</summary>
/// <param name="Date">UTC calendar date of greatest eclipse, YYYY-MM-DD (Julian calendar before 1582-10-15): the eclipse's id.</param>
/// <param name="Kind">penumbral, partial or total.</param>
/// <param name="GreatestEclipse">Instant of least distance of the Moon's centre from the shadow axis.</param>
/// <param name="DeltaTSeconds">ΔT = TT − UT1 used at greatest eclipse, seconds.</param>
/// <param name="DeltaTUncertaintySeconds">One-sigma uncertainty of ΔT, seconds.</param>
/// <param name="Gamma">Least distance of the Moon's centre from the shadow axis in Earth equatorial radii, north positive.</param>
/// <param name="PenumbralMagnitude">Fraction of the Moon's diameter in the penumbra at greatest eclipse.</param>
/// <param name="UmbralMagnitude">Fraction of the Moon's diameter in the umbra at greatest eclipse (negative: none).</param>
/// <param name="Durations">Phase durations in minutes, null where the phase does not occur.</param>
/// <param name="Contacts">The contacts P1, U1, U2, U3, U4, P4 that occur.</param>
/// <param name="Saros">Saros series and member index.</param>
/// <param name="MoonAtGreatest">The Moon's apparent geocentric place of date at greatest eclipse.</param>
/// <param name="ShadowRadii">Shadow radii at greatest eclipse toward the Moon.</param>
/// <param name="ShadowModel">Shadow model used.</param>
/// <param name="LayerKm">Opaque-layer height in km (layer model only).</param>
/// <param name="Lunation">Lunation number (0 = new Moon of 2000 January 6).</param>
/// <param name="ShadowDiagram">The Moon's path through the shadow, for drawing.</param>
public sealed record EclipseResponse(
    string Date,
    string Kind,
    InstantResponse GreatestEclipse,
    double DeltaTSeconds,
    double DeltaTUncertaintySeconds,
    double Gamma,
    double PenumbralMagnitude,
    double UmbralMagnitude,
    DurationsResponse Durations,
    IReadOnlyList<ContactResponse> Contacts,
    SarosResponse Saros,
    MoonPlaceResponse MoonAtGreatest,
    ShadowRadiiResponse ShadowRadii,
    string ShadowModel,
    double? LayerKm,
    long Lunation,
    ShadowDiagramResponse ShadowDiagram);

/// <summary>The Moon's path through the shadow as seen from the Earth's centre: offsets of the Moon's centre from the
/// shadow's centre, east and north on the sky (equator of date), at each contact and at greatest eclipse.</summary>
/// <param name="UmbraRadiusDegrees">Umbral radius at greatest eclipse, degrees.</param>
/// <param name="PenumbraRadiusDegrees">Penumbral radius at greatest eclipse, degrees.</param>
/// <param name="MoonRadiusDegrees">The Moon's semi-diameter at greatest eclipse, degrees.</param>
/// <param name="Points">The Moon's centre at P1 … P4 and greatest eclipse.</param>
public sealed record ShadowDiagramResponse(double UmbraRadiusDegrees, double PenumbraRadiusDegrees, double MoonRadiusDegrees, IReadOnlyList<PathPointResponse> Points);

/// <summary>The Moon's centre relative to the shadow's centre.</summary>
/// <param name="Name">P1, U1, U2, greatest, U3, U4 or P4.</param>
/// <param name="EastDegrees">Offset toward the east, degrees.</param>
/// <param name="NorthDegrees">Offset toward the north, degrees.</param>
public sealed record PathPointResponse(string Name, double EastDegrees, double NorthDegrees);

/// <summary>An instant in UTC and TT, with how well its UTC is known.</summary>
/// <param name="Utc">ISO 8601 UTC.</param>
/// <param name="Tt">ISO 8601 Terrestrial Time, no zone.</param>
/// <param name="UncertaintySeconds">One-sigma uncertainty of the UTC, seconds (that of ΔT).</param>
public sealed record InstantResponse(string Utc, string Tt, double UncertaintySeconds);

/// <summary>Phase durations.</summary>
/// <param name="PenumbralMinutes">P1 to P4, minutes.</param>
/// <param name="PartialMinutes">U1 to U4, minutes, or null.</param>
/// <param name="TotalMinutes">U2 to U3, minutes, or null.</param>
public sealed record DurationsResponse(double PenumbralMinutes, double? PartialMinutes, double? TotalMinutes);

/// <summary>One contact.</summary>
/// <param name="Name">P1, U1, U2, U3, U4 or P4.</param>
/// <param name="Utc">ISO 8601 UTC.</param>
/// <param name="Tt">ISO 8601 TT, no zone.</param>
/// <param name="PositionAngleDegrees">Point of contact on the Moon's limb, degrees from the north point through east.</param>
public sealed record ContactResponse(string Name, string Utc, string Tt, double PositionAngleDegrees);

/// <summary>Saros series and member.</summary>
/// <param name="Series">Saros series number.</param>
/// <param name="Member">Index of the eclipse in its series, 1 for the first.</param>
public sealed record SarosResponse(int Series, int Member);

/// <summary>The Moon's apparent geocentric place of date.</summary>
/// <param name="RightAscensionHours">Right ascension, hours.</param>
/// <param name="DeclinationDegrees">Declination, degrees.</param>
/// <param name="DistanceKm">Distance, km.</param>
/// <param name="SemiDiameterArcsec">Semi-diameter, arc-seconds.</param>
public sealed record MoonPlaceResponse(double RightAscensionHours, double DeclinationDegrees, double DistanceKm, double SemiDiameterArcsec);

/// <summary>Angular radii of the shadow at the Moon's distance.</summary>
/// <param name="UmbraDegrees">Umbral radius, degrees.</param>
/// <param name="PenumbraDegrees">Penumbral radius, degrees.</param>
public sealed record ShadowRadiiResponse(double UmbraDegrees, double PenumbraDegrees);
