using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>One observed crossing of the umbra's edge over a named feature.</summary>
/// <param name="Feature">The feature.</param>
/// <param name="Immersion">True when the umbra's edge reached the feature, false when the feature left the umbra.</param>
/// <param name="Observed">The observed instant, TT.</param>
/// <param name="UncertaintySeconds">The observer's stated one-sigma uncertainty, seconds, if given.</param>
public sealed record CraterTiming(LunarFeature Feature, bool Immersion, TtInstant Observed, double? UncertaintySeconds = null);
