using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>One contact of the Moon's limb with the shadow.</summary>
/// <param name="Name">Which contact.</param>
/// <param name="Tt">When, in TT.</param>
/// <param name="PositionAngle">Where on the Moon's limb, from the north point through east (geocentric, equator of date).</param>
public sealed record EclipseContact(ContactName Name, TtInstant Tt, Angle PositionAngle);
