using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>A stretch of one phase that the site can see.</summary>
/// <param name="Phase">Which phase.</param>
/// <param name="StartTt">Start, TT.</param>
/// <param name="EndTt">End, TT.</param>
/// <param name="StartUtc">Start, UTC.</param>
/// <param name="EndUtc">End, UTC.</param>
public sealed record VisibleSpan(EclipsePhase Phase, TtInstant StartTt, TtInstant EndTt, Instant StartUtc, Instant EndUtc)
{
    /// <summary>Length in minutes.</summary>
    public double Minutes => EndTt.SecondsSince(StartTt) / 60;
}
