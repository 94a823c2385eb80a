using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Eclipses;

/// <summary>Every eclipse of the supported span under Danjon's rule, computed once for the tests that need them all.</summary>
public sealed class WholeSpan
{
    public IReadOnlyList<LunarEclipse> Eclipses { get; } = EclipseFinder.For(ShadowModel.Danjon)
        .Between(new TtInstant(SupportedRange.Start), new TtInstant(SupportedRange.End)).ToList();
}
