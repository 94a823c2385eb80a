using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// The global circumstances of one lunar eclipse, computed under one shadow model. Every value is fixed at construction,
/// except the fitted night sky (<see cref="NightSky"/>), which is computed once, on first use, and then kept: a class,
/// not a record, because that cached fit is not part of the eclipse's value.
/// </summary>
public sealed class LunarEclipse
{
    private readonly Lazy<EclipseNightSky> _nightSky;

    /// <summary>An eclipse from its solved circumstances.</summary>
    /// <param name="lunation">Lunation number (Meeus 1998, ch. 49: 0 is the new Moon of 2000 January 6).</param>
    /// <param name="kind">Penumbral, partial or total.</param>
    /// <param name="greatestEclipse">Instant of least distance between the Moon's centre and the shadow axis, TT.</param>
    /// <param name="gamma">That least distance in Earth equatorial radii, positive when the Moon passes north of the axis.</param>
    /// <param name="penumbralMagnitude">Fraction of the Moon's diameter inside the penumbra at greatest eclipse.</param>
    /// <param name="umbralMagnitude">Fraction of the Moon's diameter inside the umbra at greatest eclipse (negative if none).</param>
    /// <param name="contacts">The contacts that occur, in time order.</param>
    /// <param name="durations">Durations of the phases.</param>
    /// <param name="saros">Saros series and member index.</param>
    /// <param name="radiiAtGreatest">Umbral and penumbral radii at greatest eclipse, toward the Moon.</param>
    /// <param name="moonAtGreatest">The Moon's apparent geocentric place at greatest eclipse.</param>
    /// <param name="model">The shadow model used.</param>
    /// <param name="passage">The fitted passage, from which local circumstances are derived.</param>
    public LunarEclipse(
        long lunation,
        EclipseKind kind,
        TtInstant greatestEclipse,
        double gamma,
        double penumbralMagnitude,
        double umbralMagnitude,
        IReadOnlyList<EclipseContact> contacts,
        PhaseDurations durations,
        SarosMember saros,
        ShadowRadii radiiAtGreatest,
        GeocentricMoonPlace moonAtGreatest,
        ShadowModel model,
        ShadowPassage passage)
    {
        Lunation = lunation;
        Kind = kind;
        GreatestEclipse = greatestEclipse;
        Gamma = gamma;
        PenumbralMagnitude = penumbralMagnitude;
        UmbralMagnitude = umbralMagnitude;
        Contacts = contacts;
        Durations = durations;
        Saros = saros;
        RadiiAtGreatest = radiiAtGreatest;
        MoonAtGreatest = moonAtGreatest;
        Model = model;
        Passage = passage;
        Moments = EclipseMoment.InTimeOrder(contacts, greatestEclipse);
        _nightSky = new Lazy<EclipseNightSky>(() => EclipseNightSky.Compute(ApparentPlaceCalculator.Default, greatestEclipse),
            LazyThreadSafetyMode.ExecutionAndPublication);
    }

    /// <summary>Lunation number (Meeus 1998, ch. 49: 0 is the new Moon of 2000 January 6).</summary>
    public long Lunation { get; }

    /// <summary>Penumbral, partial or total.</summary>
    public EclipseKind Kind { get; }

    /// <summary>Instant of least distance between the Moon's centre and the shadow axis, TT.</summary>
    public TtInstant GreatestEclipse { get; }

    /// <summary>That least distance in Earth equatorial radii, positive when the Moon passes north of the axis.</summary>
    public double Gamma { get; }

    /// <summary>Fraction of the Moon's diameter inside the penumbra at greatest eclipse.</summary>
    public double PenumbralMagnitude { get; }

    /// <summary>Fraction of the Moon's diameter inside the umbra at greatest eclipse (negative if none).</summary>
    public double UmbralMagnitude { get; }

    /// <summary>The contacts that occur, in time order.</summary>
    public IReadOnlyList<EclipseContact> Contacts { get; }

    /// <summary>Durations of the phases.</summary>
    public PhaseDurations Durations { get; }

    /// <summary>Saros series and member index.</summary>
    public SarosMember Saros { get; }

    /// <summary>Umbral and penumbral radii at greatest eclipse, toward the Moon.</summary>
    public ShadowRadii RadiiAtGreatest { get; }

    /// <summary>The Moon's apparent geocentric place at greatest eclipse.</summary>
    public GeocentricMoonPlace MoonAtGreatest { get; }

    /// <summary>The shadow model used.</summary>
    public ShadowModel Model { get; }

    /// <summary>The fitted passage, from which local circumstances are derived.</summary>
    public ShadowPassage Passage { get; }

    /// <summary>The contacts with greatest eclipse in its place, in time order.</summary>
    public IReadOnlyList<EclipseMoment> Moments { get; }

    /// <summary>
    /// The Moon and Sun over the eclipse night, fitted on first use (once, also under concurrent first use) and kept
    /// with the eclipse.
    /// </summary>
    public EclipseNightSky NightSky => _nightSky.Value;

    /// <summary>The contact of the given name, or null when it does not occur.</summary>
    public EclipseContact? Contact(ContactName name) => Contacts.FirstOrDefault(c => c.Name == name);

    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{Kind} lunar eclipse of lunation {Lunation}, greatest at {GreatestEclipse}");
}
