using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Observations;

/// <summary>Which way a shadow's edge crossed a feature.</summary>
public enum CrossingDirection
{
    /// <summary>The umbra's edge reached the feature.</summary>
    Immersion,

    /// <summary>The feature left the umbra.</summary>
    Emersion,
}

/// <summary>Where an observation was made (WGS 84).</summary>
/// <param name="LatitudeDegrees">Geodetic latitude, degrees north.</param>
/// <param name="LongitudeDegrees">Longitude, degrees east.</param>
/// <param name="ElevationMetres">Height above the ellipsoid, metres.</param>
public sealed record ObservationSite(double LatitudeDegrees, double LongitudeDegrees, double ElevationMetres);

/// <summary>A stored crater timing: when an observer saw the umbra's edge cross a named feature.</summary>
/// <param name="Id">The store's id.</param>
/// <param name="Eclipse">The eclipse's date (its greatest phase, UTC), as in the route.</param>
/// <param name="Feature">The feature's name, as in the feature list.</param>
/// <param name="Crossing">Immersion or emersion.</param>
/// <param name="Utc">The observed instant, UTC.</param>
/// <param name="Site">Where it was observed.</param>
/// <param name="UncertaintySeconds">The observer's stated uncertainty, seconds, if given.</param>
/// <param name="Optics">The observer's optics, free text, if given.</param>
/// <param name="Observer">The observer's name, if given (the only personal datum kept).</param>
/// <param name="KeyName">The name of the observatory key that wrote it.</param>
/// <param name="ReceivedUtc">When the service stored it.</param>
public sealed record CraterTimingObservation(
    long Id,
    CalendarDate Eclipse,
    string Feature,
    CrossingDirection Crossing,
    DateTimeOffset Utc,
    ObservationSite Site,
    double? UncertaintySeconds,
    string? Optics,
    string? Observer,
    string KeyName,
    DateTimeOffset ReceivedUtc);

/// <summary>A stored Danjon-scale estimate of the eclipsed Moon's brightness.</summary>
/// <param name="Id">The store's id.</param>
/// <param name="Eclipse">The eclipse's date (its greatest phase, UTC), as in the route.</param>
/// <param name="Value">L, 0 to 4 in steps of 0.5.</param>
/// <param name="Utc">When the estimate was made, UTC.</param>
/// <param name="Site">Where it was made.</param>
/// <param name="Observer">The observer's name, if given.</param>
/// <param name="KeyName">The name of the observatory key that wrote it.</param>
/// <param name="ReceivedUtc">When the service stored it.</param>
public sealed record DanjonObservation(
    long Id,
    CalendarDate Eclipse,
    double Value,
    DateTimeOffset Utc,
    ObservationSite Site,
    string? Observer,
    string KeyName,
    DateTimeOffset ReceivedUtc);

/// <summary>
/// The read side of the observers' log: what the enlargement fit, <c>shadow=measured</c> and <c>danjonL=reported</c>
/// need. Registered as a singleton; the storage backends (SQLite, PostgreSQL) implement it.
/// </summary>
public interface IObservationReader
{
    /// <summary>Every crater timing stored for one eclipse, oldest first.</summary>
    Task<IReadOnlyList<CraterTimingObservation>> CraterTimingsAsync(CalendarDate eclipse, CancellationToken cancellationToken);

    /// <summary>Every Danjon estimate stored for one eclipse, oldest first.</summary>
    Task<IReadOnlyList<DanjonObservation>> DanjonEstimatesAsync(CalendarDate eclipse, CancellationToken cancellationToken);
}
