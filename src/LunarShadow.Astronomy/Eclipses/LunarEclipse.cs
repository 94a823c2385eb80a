using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>The global circumstances of one lunar eclipse, computed under one shadow model.</summary>
/// <param name="Lunation">Lunation number (Meeus 1998, ch. 49: 0 is the new Moon of 2000 January 6).</param>
/// <param name="Kind">Penumbral, partial or total.</param>
/// <param name="GreatestEclipse">Instant of least distance between the Moon's centre and the shadow axis, TT.</param>
/// <param name="Gamma">That least distance in Earth equatorial radii, positive when the Moon passes north of the axis.</param>
/// <param name="PenumbralMagnitude">Fraction of the Moon's diameter inside the penumbra at greatest eclipse.</param>
/// <param name="UmbralMagnitude">Fraction of the Moon's diameter inside the umbra at greatest eclipse (negative if none).</param>
/// <param name="Contacts">The contacts that occur, in time order.</param>
/// <param name="Durations">Durations of the phases.</param>
/// <param name="Saros">Saros series and member index.</param>
/// <param name="RadiiAtGreatest">Umbral and penumbral radii at greatest eclipse, toward the Moon.</param>
/// <param name="MoonAtGreatest">The Moon's apparent geocentric place at greatest eclipse.</param>
/// <param name="Model">The shadow model used.</param>
/// <param name="Passage">The fitted passage, from which local circumstances are derived.</param>
public sealed record LunarEclipse(
    long Lunation,
    EclipseKind Kind,
    TtInstant GreatestEclipse,
    double Gamma,
    double PenumbralMagnitude,
    double UmbralMagnitude,
    IReadOnlyList<EclipseContact> Contacts,
    PhaseDurations Durations,
    SarosMember Saros,
    ShadowRadii RadiiAtGreatest,
    GeocentricMoonPlace MoonAtGreatest,
    ShadowModel Model,
    ShadowPassage Passage)
{
    private EclipseNightSky? _nightSky;

    /// <summary>The Moon and Sun over the eclipse night, fitted on first use and kept with the eclipse.</summary>
    public EclipseNightSky NightSky => _nightSky ??= EclipseNightSky.Compute(Frames.ApparentPlaceCalculator.Default, GreatestEclipse);

    /// <summary>The contact of the given name, or null when it does not occur.</summary>
    public EclipseContact? Contact(ContactName name) => Contacts.FirstOrDefault(c => c.Name == name);
}
