using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>A contact, or greatest eclipse, as seen from a site.</summary>
/// <param name="Name">The contact, or null for greatest eclipse.</param>
/// <param name="Tt">When, TT.</param>
/// <param name="Utc">When, UTC.</param>
/// <param name="Moon">The Moon's place then.</param>
/// <param name="Visible">Whether the Moon is above the horizon profile and the minimum altitude then.</param>
/// <param name="SunAltitude">The Sun's true altitude then.</param>
/// <param name="Sky">The sky state then.</param>
/// <param name="ZenithPositionAngle">The point of contact on the limb, from the zenith direction through east as seen (null at greatest).</param>
public sealed record LocalContact(
    ContactName? Name, TtInstant Tt, Instant Utc, LocalMoon Moon, bool Visible, Angle SunAltitude, SkyState Sky, Angle? ZenithPositionAngle)
{
    /// <summary>P1…P4, or "greatest".</summary>
    public string Label => Name?.ToString() ?? EclipseMoment.GreatestLabel;
}

/// <summary>The largest umbral magnitude the site sees.</summary>
/// <param name="Value">The magnitude (negative when only the penumbra is seen).</param>
/// <param name="Tt">When, TT.</param>
/// <param name="Utc">When, UTC.</param>
/// <param name="Altitude">The Moon's apparent altitude then.</param>
public sealed record GreatestVisibleMagnitude(double Value, TtInstant Tt, Instant Utc, Angle Altitude);
