using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using NodaTime;

namespace LunarShadow.Api.Observations;

/// <summary>Stored observations to the public list's contract (no key ids, only the observatory's display name).</summary>
internal static class ObservationMapping
{
    public static ObservationResponse ToResponse(object stored) => stored switch
    {
        CraterTimingObservation t => new ObservationResponse(t.Id, ObservationKinds.CraterTiming, t.Feature, WireNames.Of(t.Crossing), null,
            Utc(t.Utc), Site(t.Site), t.UncertaintySeconds, t.Optics, t.Observer, t.KeyName, Utc(t.ReceivedUtc)),
        DanjonObservation d => new ObservationResponse(d.Id, ObservationKinds.Danjon, null, null, d.Value,
            Utc(d.Utc), Site(d.Site), null, null, d.Observer, d.KeyName, Utc(d.ReceivedUtc)),
        _ => throw new ArgumentException("Not an observation.", nameof(stored)),
    };

    private static string Utc(DateTimeOffset instant) => TimeFormats.Utc(Instant.FromDateTimeOffset(instant));

    private static ObservationSiteResponse Site(ObservationSite s) => new(s.LatitudeDegrees, s.LongitudeDegrees, s.ElevationMetres);
}
