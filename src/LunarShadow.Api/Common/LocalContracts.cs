namespace LunarShadow.Api.Common;

/// <summary>What one site sees of one eclipse.</summary>
/// <param name="Site">The site as understood (echo).</param>
/// <param name="Eclipse">The eclipse.</param>
/// <param name="Night">The local dates of the night that holds the visible part (or greatest eclipse when nothing is seen).</param>
/// <param name="DeltaTSeconds">ΔT used, seconds.</param>
/// <param name="DeltaTUncertaintySeconds">Its one-sigma uncertainty, seconds.</param>
/// <param name="Contacts">P1, U1, U2, greatest, U3, U4, P4 as they occur, seen from the site.</param>
/// <param name="MoonEvents">Moonrise, moonset and horizon-profile events within 12 hours of greatest eclipse.</param>
/// <param name="MoonHorizon">rises-or-sets, up-throughout or down-throughout (within 12 hours of greatest eclipse).</param>
/// <param name="VisiblePhases">Visible stretches of each phase: penumbral (P1–P4), partial (U1–U4), total (U2–U3).</param>
/// <param name="VisibleTotalityMinutes">Minutes of totality visible from the site.</param>
/// <param name="GreatestVisibleUmbralMagnitude">Greatest umbral magnitude seen, or null when nothing is seen.</param>
/// <param name="Summary">One plain line on what the site sees, naming the night, the zone and what is missed.</param>
/// <param name="PublicNight">The plan within the opening hours, when <c>open</c> was given.</param>
/// <param name="Cautions">Safety notes that apply to this night.</param>
/// <param name="Track">The Moon's and Sun's altitude through the night, when <c>track</c> was asked for.</param>
/// <param name="MeasuredShadow">With shadow=measured: the crater timings used and the fitted enlargement.</param>
public sealed record LocalResponse(
    SiteEcho Site,
    EclipseBrief Eclipse,
    NightResponse Night,
    double DeltaTSeconds,
    double DeltaTUncertaintySeconds,
    IReadOnlyList<LocalContactResponse> Contacts,
    IReadOnlyList<MoonEventResponse> MoonEvents,
    string MoonHorizon,
    IReadOnlyList<VisiblePhaseResponse> VisiblePhases,
    double VisibleTotalityMinutes,
    VisibleMagnitudeResponse? GreatestVisibleUmbralMagnitude,
    string Summary,
    PublicNightResponse? PublicNight,
    IReadOnlyList<string> Cautions,
    IReadOnlyList<TrackPointResponse>? Track = null,
    MeasuredShadowEcho? MeasuredShadow = null)
{
    /// <summary>Deprecated: the former name of <see cref="GreatestVisibleUmbralMagnitude"/>, written for one more release.</summary>
    public VisibleMagnitudeResponse? MaxVisibleUmbralMagnitude => GreatestVisibleUmbralMagnitude;
}

/// <summary>One sample of the night.</summary>
/// <param name="Utc">UTC.</param>
/// <param name="Local">Local time.</param>
/// <param name="MoonAltitudeDegrees">The Moon's apparent altitude, degrees.</param>
/// <param name="MoonAzimuthDegrees">The Moon's azimuth, degrees.</param>
/// <param name="HorizonAltitudeDegrees">The horizon profile's altitude at the Moon's azimuth, degrees.</param>
/// <param name="SunAltitudeDegrees">The Sun's airless altitude, degrees.</param>
/// <param name="Sky">day, civil-twilight, nautical-twilight, astronomical-twilight or night, by the Sun's altitude (the
/// service's one twilight classification, so clients need no copy of the thresholds).</param>
public sealed record TrackPointResponse(
    string Utc, string Local, double MoonAltitudeDegrees, double MoonAzimuthDegrees, double HorizonAltitudeDegrees, double SunAltitudeDegrees, string Sky);

/// <summary>The site as the service understood it.</summary>
/// <param name="Name">The name given, if any.</param>
/// <param name="LatitudeDegrees">Latitude, degrees.</param>
/// <param name="LongitudeDegrees">Longitude, degrees.</param>
/// <param name="ElevationMeters">Height, metres.</param>
/// <param name="TimeZone">IANA time zone used.</param>
/// <param name="TimeZoneAbbreviations">The zone's abbreviations in force on the night(s) concerned, from the tzdb (e.g. CEST and CET on a night the clocks go back; UTC+14:00 where the tzdb has no letters).</param>
/// <param name="MinAltitudeDegrees">Minimum useful altitude of the Moon's upper limb, degrees.</param>
/// <param name="Horizon">Horizon-profile points, if any.</param>
/// <param name="Hint">A hint about defaults that were applied, if any.</param>
public sealed record SiteEcho(
    string? Name, double LatitudeDegrees, double LongitudeDegrees, double ElevationMeters, string TimeZone,
    IReadOnlyList<string> TimeZoneAbbreviations, double MinAltitudeDegrees, IReadOnlyList<HorizonPointResponse> Horizon, string? Hint);

/// <summary>A night named by its local calendar dates (astronomers' calendar: Julian before 1582-10-15).</summary>
/// <param name="Evening">Local date on which the night begins, YYYY-MM-DD.</param>
/// <param name="Morning">Local date on which it ends, YYYY-MM-DD.</param>
public sealed record NightResponse(string Evening, string Morning);

/// <summary>One horizon-profile point.</summary>
/// <param name="AzimuthDegrees">Azimuth, degrees from north through east.</param>
/// <param name="AltitudeDegrees">Altitude of the horizon there, degrees.</param>
public sealed record HorizonPointResponse(double AzimuthDegrees, double AltitudeDegrees);

/// <summary>The eclipse in brief.</summary>
/// <param name="Date">UTC date of greatest eclipse (the eclipse's id).</param>
/// <param name="Kind">penumbral, partial or total.</param>
/// <param name="GreatestEclipseUtc">Greatest eclipse, UTC.</param>
/// <param name="UmbralMagnitude">Global umbral magnitude.</param>
/// <param name="ShadowModel">Shadow model used.</param>
public sealed record EclipseBrief(string Date, string Kind, string GreatestEclipseUtc, double UmbralMagnitude, string ShadowModel);

/// <summary>A contact seen from the site.</summary>
/// <param name="Name">P1, U1, U2, greatest, U3, U4 or P4.</param>
/// <param name="Utc">UTC.</param>
/// <param name="Local">Local time with its UTC offset.</param>
/// <param name="LocalNote">A note when the local time is ambiguous (clocks go back).</param>
/// <param name="AltitudeDegrees">The Moon's topocentric altitude with refraction, degrees.</param>
/// <param name="AzimuthDegrees">The Moon's azimuth, degrees from north through east.</param>
/// <param name="Visible">Whether the Moon is above the horizon profile and minimum altitude.</param>
/// <param name="SunAltitudeDegrees">The Sun's altitude (airless), degrees.</param>
/// <param name="Sky">day, civil-twilight, nautical-twilight, astronomical-twilight or night.</param>
/// <param name="ZenithPositionAngleDegrees">Point of contact on the Moon's limb, degrees from the zenith direction through east as seen; null at greatest.</param>
public sealed record LocalContactResponse(
    string Name, string Utc, string Local, string? LocalNote, double AltitudeDegrees, double AzimuthDegrees, bool Visible,
    double SunAltitudeDegrees, string Sky, double? ZenithPositionAngleDegrees);

/// <summary>A horizon event of the Moon.</summary>
/// <param name="Type">rise, set, clears-horizon-profile or hidden-by-horizon-profile.</param>
/// <param name="Utc">UTC.</param>
/// <param name="Local">Local time with offset.</param>
/// <param name="AzimuthDegrees">Azimuth, degrees.</param>
public sealed record MoonEventResponse(string Type, string Utc, string Local, double AzimuthDegrees);

/// <summary>A visible stretch of a phase.</summary>
/// <param name="Phase">penumbral (P1–P4), partial (U1–U4) or total (U2–U3).</param>
/// <param name="StartUtc">Start, UTC.</param>
/// <param name="EndUtc">End, UTC.</param>
/// <param name="StartLocal">Start, local time.</param>
/// <param name="EndLocal">End, local time.</param>
/// <param name="Minutes">Length, minutes.</param>
public sealed record VisiblePhaseResponse(string Phase, string StartUtc, string EndUtc, string StartLocal, string EndLocal, double Minutes);

/// <summary>The largest umbral magnitude the site sees.</summary>
/// <param name="Value">Umbral magnitude (negative when only the penumbra is seen).</param>
/// <param name="Utc">When, UTC.</param>
/// <param name="Local">When, local time.</param>
/// <param name="AltitudeDegrees">The Moon's altitude then, degrees.</param>
public sealed record VisibleMagnitudeResponse(double Value, string Utc, string Local, double AltitudeDegrees);

/// <summary>The eclipse inside an observatory's opening hours.</summary>
/// <param name="Opens">When the opening hours begin that night, local time.</param>
/// <param name="Closes">When they end, local time.</param>
/// <param name="OpensUtc">When they begin, UTC.</param>
/// <param name="ClosesUtc">When they end, UTC.</param>
/// <param name="Phases">Visible stretches of each phase inside the opening hours.</param>
/// <param name="Session">A suggested session, or null when nothing worth showing falls inside.</param>
/// <param name="Note">One plain line about the plan, saying which of two repeated local times is meant.</param>
public sealed record PublicNightResponse(string Opens, string Closes, string OpensUtc, string ClosesUtc, IReadOnlyList<VisiblePhaseResponse> Phases, SessionResponse? Session, string Note);

/// <summary>A suggested public session.</summary>
/// <param name="DoorsOpen">Local time.</param>
/// <param name="DoorsClose">Local time.</param>
/// <param name="DoorsOpenUtc">UTC.</param>
/// <param name="DoorsCloseUtc">UTC.</param>
/// <param name="MoonAltitudeAtOpenDegrees">Moon's altitude when the doors open, degrees.</param>
/// <param name="MoonAltitudeAtCloseDegrees">Moon's altitude when they close, degrees.</param>
public sealed record SessionResponse(string DoorsOpen, string DoorsClose, string DoorsOpenUtc, string DoorsCloseUtc, double MoonAltitudeAtOpenDegrees, double MoonAltitudeAtCloseDegrees);

/// <summary>Local circumstances for many sites.</summary>
/// <param name="Count">Number of sites.</param>
/// <param name="Sites">One entry per site, in request order.</param>
public sealed record LocalBatchResponse(int Count, IReadOnlyList<LocalResponse> Sites);
