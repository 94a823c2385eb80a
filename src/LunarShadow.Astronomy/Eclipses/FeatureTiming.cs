using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>One crossing of a shadow's edge over a feature.</summary>
/// <param name="Tt">When, in TT (a physical event on the Moon: the same instant for every observer, light time aside).</param>
/// <param name="PositionAngle">The feature's position angle on the disc seen from the Earth's centre, from north through east.</param>
/// <param name="FacesEarth">Whether the feature lies on the hemisphere turned toward the Earth's centre at that instant.</param>
public sealed record FeatureCrossing(TtInstant Tt, Angle PositionAngle, bool FacesEarth);

/// <summary>When the umbra's edge, and the penumbra's, cross one feature. Null crossings never happen in this eclipse.</summary>
/// <param name="Feature">The feature.</param>
/// <param name="UmbraImmersion">The umbra's edge reaches the feature.</param>
/// <param name="UmbraEmersion">The feature leaves the umbra.</param>
/// <param name="PenumbraImmersion">The penumbra's outer edge reaches the feature.</param>
/// <param name="PenumbraEmersion">The feature leaves the penumbra.</param>
public sealed record FeatureTiming(
    LunarFeature Feature,
    FeatureCrossing? UmbraImmersion,
    FeatureCrossing? UmbraEmersion,
    FeatureCrossing? PenumbraImmersion,
    FeatureCrossing? PenumbraEmersion)
{
    /// <summary>Whether the umbra reaches the feature at all.</summary>
    public bool ReachedByUmbra => UmbraImmersion is not null;
}
