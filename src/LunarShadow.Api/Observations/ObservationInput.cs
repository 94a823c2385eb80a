using NodaTime;

namespace LunarShadow.Api.Observations;

/// <summary>One observation as read from the body, before the checks against the eclipse.</summary>
/// <param name="Prefix">How problems with it are named ("" for a single object, "[3]." in an array).</param>
/// <param name="Kind">crater-timing or danjon.</param>
/// <param name="Feature">The feature's catalogue name, for a timing.</param>
/// <param name="Crossing">Immersion or emersion, for a timing.</param>
/// <param name="DanjonValue">L, for an estimate.</param>
/// <param name="Utc">The observed instant.</param>
/// <param name="Site">Where.</param>
/// <param name="UncertaintySeconds">The stated uncertainty, if given.</param>
/// <param name="Optics">The optics, if given.</param>
/// <param name="Observer">The observer's name, if given.</param>
internal sealed record ObservationInput(
    string Prefix, string Kind, string? Feature, CrossingDirection? Crossing, double? DanjonValue, Instant Utc, ObservationSite Site,
    double? UncertaintySeconds, string? Optics, string? Observer);
