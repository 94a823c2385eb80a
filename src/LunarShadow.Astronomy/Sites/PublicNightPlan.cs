using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>What an observatory with set opening hours can show of one eclipse.</summary>
/// <param name="Window">The opening used: the one that overlaps the visible eclipse most.</param>
/// <param name="PhasesInWindow">The visible stretches of each phase inside the opening.</param>
/// <param name="Session">A suggested public session, or null when nothing worth showing falls in the opening.</param>
/// <param name="Outcome">What the plan comes to, for the caller to put into words.</param>
public sealed record PublicNightPlan(OpeningWindow Window, IReadOnlyList<VisibleSpan> PhasesInWindow, SuggestedSession? Session, PublicNightOutcome Outcome)
{
    /// <summary>Minutes of totality inside the opening.</summary>
    public double TotalityMinutesInWindow => PhasesInWindow.Where(p => p.Phase == EclipsePhase.Total).Sum(p => p.Minutes);
}

/// <summary>What a public-night plan comes to.</summary>
public enum PublicNightOutcome
{
    /// <summary>Nothing of the eclipse is visible from the site.</summary>
    NothingVisible,

    /// <summary>The eclipse is visible, but entirely outside the opening hours.</summary>
    OutsideOpeningHours,

    /// <summary>Only the faint penumbral phase falls within the opening hours.</summary>
    OnlyFaintPenumbra,

    /// <summary>A session is suggested.</summary>
    Session,
}

/// <summary>A suggested public session.</summary>
/// <param name="DoorsOpen">Doors open.</param>
/// <param name="DoorsClose">Doors close.</param>
/// <param name="MoonAltitudeAtOpen">The Moon's apparent altitude when the doors open.</param>
/// <param name="MoonAltitudeAtClose">The Moon's apparent altitude when they close.</param>
public sealed record SuggestedSession(Instant DoorsOpen, Instant DoorsClose, Angle MoonAltitudeAtOpen, Angle MoonAltitudeAtClose);
