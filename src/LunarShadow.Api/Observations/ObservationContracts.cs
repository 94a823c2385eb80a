namespace LunarShadow.Api.Observations;

/// <summary>Where an observation was made, as listed.</summary>
/// <param name="Lat">Geodetic latitude, degrees north.</param>
/// <param name="Lon">Longitude, degrees east.</param>
/// <param name="Elevation">Height above the WGS84 ellipsoid, metres.</param>
public sealed record ObservationSiteResponse(double Lat, double Lon, double Elevation);

/// <summary>One stored observation, as listed publicly.</summary>
/// <param name="Id">The store's id.</param>
/// <param name="Kind">crater-timing or danjon.</param>
/// <param name="Feature">The feature, for a timing.</param>
/// <param name="Crossing">immersion or emersion, for a timing.</param>
/// <param name="Value">Danjon L, for an estimate.</param>
/// <param name="Utc">The observed instant, UTC.</param>
/// <param name="Site">Where.</param>
/// <param name="UncertaintySeconds">The observer's stated uncertainty, seconds, if given.</param>
/// <param name="Optics">The optics, if given.</param>
/// <param name="Observer">The observer's name, if given.</param>
/// <param name="Observatory">The display name of the observatory key that wrote it.</param>
/// <param name="ReceivedUtc">When the service stored it.</param>
public sealed record ObservationResponse(
    long Id, string Kind, string? Feature, string? Crossing, double? Value, string Utc, ObservationSiteResponse Site,
    double? UncertaintySeconds, string? Optics, string? Observer, string Observatory, string ReceivedUtc);

/// <summary>Every observation of one eclipse, in the order they were stored.</summary>
/// <param name="Eclipse">The eclipse's date (greatest phase, UTC).</param>
/// <param name="Count">How many are listed.</param>
/// <param name="Observations">The observations.</param>
public sealed record ObservationListResponse(string Eclipse, int Count, IReadOnlyList<ObservationResponse> Observations);

/// <summary>What a successful write stored.</summary>
/// <param name="Eclipse">The eclipse's date.</param>
/// <param name="Stored">How many observations were stored (all of the request).</param>
/// <param name="Ids">Their ids, in request order.</param>
/// <param name="Observatory">The display name of the key that wrote them.</param>
public sealed record ObservationsStoredResponse(string Eclipse, int Stored, IReadOnlyList<long> Ids, string Observatory);
