namespace LunarShadow.Api.Craters;

/// <summary>When the Earth's shadow crosses named features on the Moon during one eclipse.</summary>
/// <param name="Date">UTC date of greatest eclipse.</param>
/// <param name="Kind">total, partial or penumbral.</param>
/// <param name="ShadowModel">The shadow model the timings use.</param>
/// <param name="LayerKm">Opaque-layer height for the layer model, km.</param>
/// <param name="DeltaTModel">ΔT model (or "fixed").</param>
/// <param name="DeltaTSeconds">ΔT used, seconds.</param>
/// <param name="DeltaTUncertaintySeconds">One-sigma uncertainty of ΔT, seconds: the uncertainty of every UTC below.</param>
/// <param name="Site">The site when one was given (it adds visibility only: a crossing happens at the same instant for everyone).</param>
/// <param name="FeatureSource">Where the features' coordinates come from.</param>
/// <param name="ReachedCount">How many of the listed features the umbra reaches.</param>
/// <param name="Features">The features, in the order the umbra reaches them; those it never reaches come last.</param>
/// <param name="DataVersion">Version tag of the embedded ephemeris data.</param>
/// <param name="MeasuredShadow">With shadow=measured: the timings used and the fitted enlargement (ShadowModel is then "enlarged").</param>
public sealed record CraterTimingsResponse(
    string Date,
    string Kind,
    string ShadowModel,
    double? LayerKm,
    string DeltaTModel,
    double DeltaTSeconds,
    double DeltaTUncertaintySeconds,
    CraterSiteResponse? Site,
    string FeatureSource,
    int ReachedCount,
    IReadOnlyList<CraterTimingResponse> Features,
    string DataVersion,
    Common.MeasuredShadowEcho? MeasuredShadow = null);

/// <summary>The site the visibility refers to.</summary>
/// <param name="Name">Its name, when given.</param>
/// <param name="LatitudeDegrees">Geodetic latitude, degrees.</param>
/// <param name="LongitudeDegrees">Longitude east, degrees.</param>
/// <param name="TimeZone">IANA zone of the local times.</param>
public sealed record CraterSiteResponse(string? Name, double LatitudeDegrees, double LongitudeDegrees, string TimeZone);

/// <summary>One feature and the shadow's crossings over it.</summary>
/// <param name="Name">IAU name.</param>
/// <param name="LatitudeDegrees">Selenographic latitude, degrees.</param>
/// <param name="LongitudeDegrees">Selenographic longitude, east positive, degrees.</param>
/// <param name="ReachedByUmbra">Whether the umbra reaches it in this eclipse.</param>
/// <param name="Immersion">The umbra's edge reaches it (null when never).</param>
/// <param name="Emersion">It leaves the umbra (null when never).</param>
/// <param name="PenumbralImmersion">The penumbra's outer edge reaches it (only with penumbra=true).</param>
/// <param name="PenumbralEmersion">It leaves the penumbra (only with penumbra=true).</param>
/// <param name="AtGreatest">Where the feature lies relative to the shadow axis at greatest eclipse, in the frame of the eclipse's shadow diagram.</param>
public sealed record CraterTimingResponse(
    string Name,
    double LatitudeDegrees,
    double LongitudeDegrees,
    bool ReachedByUmbra,
    CrossingResponse? Immersion,
    CrossingResponse? Emersion,
    CrossingResponse? PenumbralImmersion = null,
    CrossingResponse? PenumbralEmersion = null,
    AxisOffsetResponse? AtGreatest = null);

/// <summary>A feature's place relative to the shadow axis at one instant, as the shadow diagram draws the Moon's centre.</summary>
/// <param name="EastDegrees">Angle east of the shadow axis, degrees (gnomonic, geocentric).</param>
/// <param name="NorthDegrees">Angle north of the shadow axis, degrees.</param>
/// <param name="FacesEarth">Whether the feature is on the hemisphere turned to the Earth at that instant.</param>
public sealed record AxisOffsetResponse(double EastDegrees, double NorthDegrees, bool FacesEarth);

/// <summary>One crossing of a shadow's edge over a feature.</summary>
/// <param name="Utc">UTC, ISO 8601.</param>
/// <param name="Tt">Terrestrial Time, ISO 8601 without zone.</param>
/// <param name="UncertaintySeconds">One-sigma uncertainty of the UTC from ΔT, seconds.</param>
/// <param name="PositionAngleDegrees">The feature's position angle on the disc from celestial north through east, geocentric, degrees.</param>
/// <param name="FacesEarth">Whether the feature is on the hemisphere turned to the Earth (false: just behind the limb by libration).</param>
/// <param name="Local">Local time with its UTC offset (with a site).</param>
/// <param name="Visible">Whether the Moon is up and clear of the horizon profile and minimum altitude (with a site).</param>
/// <param name="MoonAltitudeDegrees">The Moon's apparent altitude (with a site).</param>
/// <param name="Sky">day, civil-twilight, nautical-twilight, astronomical-twilight or night (with a site).</param>
/// <param name="ZenithPositionAngleDegrees">The feature's position angle measured from the zenith (with a site).</param>
public sealed record CrossingResponse(
    string Utc,
    string Tt,
    double UncertaintySeconds,
    double PositionAngleDegrees,
    bool FacesEarth,
    string? Local = null,
    bool? Visible = null,
    double? MoonAltitudeDegrees = null,
    string? Sky = null,
    double? ZenithPositionAngleDegrees = null);
