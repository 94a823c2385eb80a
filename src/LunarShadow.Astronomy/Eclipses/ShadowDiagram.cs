using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// The Moon's passage through the shadow as drawn from the Earth's centre: the Moon's centre relative to the shadow axis
/// at each <see cref="EclipseMoment"/>, east and north in the plane of the sky (gnomonic projection, so straight lines
/// stay straight), with the shadow and Moon radii at greatest eclipse.
/// </summary>
/// <param name="UmbraRadius">Umbral radius at greatest eclipse, toward the Moon.</param>
/// <param name="PenumbraRadius">Penumbral radius at greatest eclipse, toward the Moon.</param>
/// <param name="MoonRadius">The Moon's geocentric semi-diameter at greatest eclipse.</param>
/// <param name="Points">The Moon's centre at each moment, in time order.</param>
public sealed record ShadowDiagram(Angle UmbraRadius, Angle PenumbraRadius, Angle MoonRadius, IReadOnlyList<ShadowDiagramPoint> Points)
{
    /// <summary>The diagram of an eclipse, from its fitted passage.</summary>
    public static ShadowDiagram Of(LunarEclipse eclipse)
    {
        var points = eclipse.Moments.Select(m =>
        {
            // ξ and η are the gnomonic coordinates (tangents) of the Moon's direction about the axis.
            var g = eclipse.Passage.At(eclipse.Passage.HoursFromCenter(m.Tt));
            return new ShadowDiagramPoint(m, g.EastOfAxis, g.NorthOfAxis);
        }).ToList();
        return new ShadowDiagram(eclipse.RadiiAtGreatest.Umbra, eclipse.RadiiAtGreatest.Penumbra, eclipse.MoonAtGreatest.SemiDiameter, points);
    }
}

/// <summary>The Moon's centre at one moment of the diagram.</summary>
/// <param name="Moment">Which moment.</param>
/// <param name="East">Offset east of the shadow axis.</param>
/// <param name="North">Offset north of the shadow axis.</param>
public sealed record ShadowDiagramPoint(EclipseMoment Moment, Angle East, Angle North);
