using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Astronomy.Photography;

/// <summary>The state of the Moon at a timeline row.</summary>
public enum MoonPhaseState
{
    /// <summary>Outside the shadow.</summary>
    Uneclipsed,

    /// <summary>Partly or wholly in the penumbra only.</summary>
    Penumbral,

    /// <summary>Partly in the umbra.</summary>
    Partial,

    /// <summary>Wholly in the umbra.</summary>
    Total,
}

/// <summary>One row of the shooting timeline.</summary>
/// <param name="Tt">When, TT.</param>
/// <param name="Utc">When, UTC.</param>
/// <param name="Contact">The contact at this row, if it is one (P1…P4 or greatest).</param>
/// <param name="Phase">The Moon's state.</param>
/// <param name="UmbralFraction">Fraction of the disc inside the umbra.</param>
/// <param name="PenumbralFraction">Fraction of the disc inside the penumbra but outside the umbra.</param>
/// <param name="Altitude">The Moon's apparent altitude.</param>
/// <param name="Azimuth">The Moon's azimuth.</param>
/// <param name="AirMass">Air mass (Kasten &amp; Young 1989).</param>
/// <param name="BrightnessStops">Brightness of what the exposure is for, in stops from the uneclipsed Moon above the air (negative: darker).</param>
/// <param name="LimbStops">The brightest limb point, stops, eclipse only (no air).</param>
/// <param name="DiscStops">The disc's mean, stops, eclipse only (no air).</param>
/// <param name="Exposure">The suggested exposure and bracket.</param>
/// <param name="Warnings">Things to watch.</param>
public sealed record TimelineRow(
    TtInstant Tt, Instant Utc, string? Contact, MoonPhaseState Phase, double UmbralFraction, double PenumbralFraction,
    Angle Altitude, Angle Azimuth, double AirMass, double BrightnessStops, double LimbStops, double DiscStops,
    Exposure Exposure, IReadOnlyList<PhotoWarning> Warnings);

/// <summary>A photo plan for one eclipse, one site and one camera.</summary>
/// <param name="Local">What the site sees.</param>
/// <param name="Camera">The camera.</param>
/// <param name="Settings">The plan's settings.</param>
/// <param name="ExtinctionPerAirMass">The extinction coefficient used.</param>
/// <param name="Timeline">Rows at every visible contact and every interval across the visible eclipse.</param>
/// <param name="Framing">Field of view, image scale, blur limits.</param>
/// <param name="Sequences">Multi-exposure and time-lapse plans (null when nothing is visible).</param>
/// <param name="UncertaintyStops">How far the brightness estimate may be off in totality, stops.</param>
/// <param name="Cautions">Safety notes.</param>
/// <param name="Notes">Notes that hold for a run of rows (an ISO change), given once per run rather than on each row.</param>
public sealed record PhotoPlan(
    LocalCircumstances Local, Camera Camera, PhotoSettings Settings, double ExtinctionPerAirMass, IReadOnlyList<TimelineRow> Timeline,
    Framing Framing, Sequences? Sequences, double UncertaintyStops, IReadOnlyList<string> Cautions, IReadOnlyList<PlanNote> Notes);
