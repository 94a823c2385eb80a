using LunarShadow.Astronomy.Eclipses;

namespace LunarShadow.Astronomy.Sites;

/// <summary>What one site sees of one eclipse.</summary>
/// <param name="Site">The site.</param>
/// <param name="Eclipse">The eclipse.</param>
/// <param name="DeltaTSeconds">The ΔT used to place the Earth's rotation.</param>
/// <param name="Contacts">P1, U1, U2, greatest, U3, U4, P4 as they occur.</param>
/// <param name="MoonEvents">Rising, setting and horizon-profile events within 12 hours of greatest eclipse.</param>
/// <param name="HorizonState">Whether the Moon crosses the horizon in those 24 hours.</param>
/// <param name="VisiblePhases">The visible stretches of each phase.</param>
/// <param name="GreatestVisibleUmbralMagnitude">The largest umbral magnitude seen, or null when nothing is seen.</param>
public sealed record LocalCircumstances(
    Site Site,
    LunarEclipse Eclipse,
    double DeltaTSeconds,
    IReadOnlyList<LocalContact> Contacts,
    IReadOnlyList<MoonEvent> MoonEvents,
    MoonHorizonState HorizonState,
    IReadOnlyList<VisibleSpan> VisiblePhases,
    GreatestVisibleMagnitude? GreatestVisibleUmbralMagnitude)
{
    /// <summary>Total visible minutes of a phase.</summary>
    public double VisibleMinutes(EclipsePhase phase) => VisiblePhases.Where(p => p.Phase == phase).Sum(p => p.Minutes);

    /// <summary>Whether any part of the eclipse is visible.</summary>
    public bool AnyVisible => VisiblePhases.Count > 0;

    /// <summary>What the site sees, as codes and numbers to write a summary from.</summary>
    public LocalOutline Outline => LocalOutline.Of(this);
}
