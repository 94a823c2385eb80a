using System.Text.Json;
using LunarShadow.Api.Common;
using LunarShadow.Api.Photography;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Sites;
using NodaTime;

namespace LunarShadow.Api.Tests.Sweep;

/// <summary>The invariants every answer must keep, whatever the eclipse, site and format.</summary>
internal static class SweepChecks
{
    // Tolerances: instants agree to the millisecond of the wire; altitudes on the wire carry 0.01°.
    private const double AltitudeToleranceDegrees = 0.02;

    /// <summary>Contacts in order: P1 ≤ U1 ≤ U2 ≤ greatest ≤ U3 ≤ U4 ≤ P4.</summary>
    public static void ContactsOrdered(LocalCircumstances local)
    {
        var order = new[] { "P1", "U1", "U2", "greatest", "U3", "U4", "P4" };
        var labels = local.Contacts.Select(c => c.Label).ToList();
        Require(labels.SequenceEqual(order.Where(labels.Contains)), $"contacts out of name order: {string.Join(",", labels)}");
        for (var i = 1; i < local.Contacts.Count; i++)
            Require(local.Contacts[i].Tt >= local.Contacts[i - 1].Tt, $"{local.Contacts[i].Label} before {local.Contacts[i - 1].Label}");
        Require(labels.Contains("P1") && labels.Contains("P4"), "P1 or P4 missing");
        Require(labels.Contains("U1") == labels.Contains("U4") && labels.Contains("U2") == labels.Contains("U3"), "unpaired umbral contacts");
    }

    /// <summary>Each visible stretch lies inside its phase and inside the time the Moon stands above every horizon.</summary>
    public static void VisibleStretchesInsidePhaseAndMoonUp(LocalCircumstances local)
    {
        var e = local.Eclipse;
        var sky = new LocalSky(e.NightSky, local.Site, local.DeltaTSeconds);
        foreach (var span in local.VisiblePhases)
        {
            var (start, end) = span.Phase switch
            {
                EclipsePhase.Total => (e.Contact(ContactName.U2)!.Tt, e.Contact(ContactName.U3)!.Tt),
                EclipsePhase.Partial => (e.Contact(ContactName.U1)!.Tt, e.Contact(ContactName.U4)!.Tt),
                _ => (e.Contact(ContactName.P1)!.Tt, e.Contact(ContactName.P4)!.Tt),
            };
            Require(span.StartTt.SecondsSince(start) >= -1e-3 && end.SecondsSince(span.EndTt) >= -1e-3, $"{span.Phase} stretch outside its contacts");
            Require(span.EndTt >= span.StartTt, "stretch ends before it starts");
            foreach (var f in new[] { 0.001, 0.5, 0.999 })
            {
                var tt = span.StartTt.PlusSeconds(f * span.EndTt.SecondsSince(span.StartTt));
                var moon = sky.MoonAt(e.NightSky.HoursFromCenter(tt));
                var floor = Math.Max(Math.Max(local.Site.Horizon.AltitudeAt(moon.Azimuth).Degrees, local.Site.MinimumAltitude.Degrees), -local.Site.HorizonDip.Degrees);
                Require(moon.UpperLimbApparentAltitude.Degrees >= floor - AltitudeToleranceDegrees,
                    FormattableString.Invariant($"{span.Phase} stretch has the Moon's limb at {moon.UpperLimbApparentAltitude.Degrees:0.###}° under its horizon {floor:0.###}°"));
            }
        }
    }

    /// <summary>The local wall time is the UTC plus the zone's offset then, to the millisecond.</summary>
    public static void LocalIsUtcPlusOffset(string utc, string local, DateTimeZone zone)
    {
        var u = Readers.Instant(utc);
        var l = Readers.Instant(local);
        Require(u.Offset == TimeSpan.Zero, $"UTC {utc} has an offset");
        Require(l.UtcTicks == u.UtcTicks, $"local {local} is not UTC {utc}");
        // ISO 8601 offsets carry whole minutes: a local-mean-time offset with seconds is written rounded to the minute.
        var offset = TimeSpan.FromMinutes(Math.Round(zone.GetUtcOffset(NodaTime.Instant.FromDateTimeOffset(u)).Seconds / 60.0, MidpointRounding.AwayFromZero));
        Require(l.Offset == offset, $"local {local} carries offset {l.Offset}, the zone {zone.Id} has {offset}");
    }

    // Explanatory Supplement (2013), ch. 15: day above −0°50′, civil to −6°, nautical to −12°, astronomical to −18°.
    /// <summary>The sky state on the wire matches the Sun's altitude on the wire (rounded to 0.01°).</summary>
    public static void SkyMatchesSun(LocalContactResponse c)
    {
        var h = c.SunAltitudeDegrees;
        string[] allowed = (h switch
        {
            > -50.0 / 60 => ["day"],
            > -6 => ["civil-twilight"],
            > -12 => ["nautical-twilight"],
            > -18 => ["astronomical-twilight"],
            _ => new[] { "night" },
        }).Concat(Neighbour(h)).ToArray();
        Require(allowed.Contains(c.Sky), $"{c.Name}: sky {c.Sky} with the Sun at {h}°");
    }

    // Within the wire's rounding of a boundary either side is right.
    private static IEnumerable<string> Neighbour(double h)
    {
        foreach (var (edge, below, above) in new[] { (-50.0 / 60, "civil-twilight", "day"), (-6.0, "nautical-twilight", "civil-twilight"), (-12.0, "astronomical-twilight", "nautical-twilight"), (-18.0, "night", "astronomical-twilight") })
            if (Math.Abs(h - edge) <= 0.006) { yield return below; yield return above; }
    }

    /// <summary>Every shutter time within the camera's settable range (to the wire's four significant figures).</summary>
    public static void ShutterInRange(double seconds, Camera camera, string where)
    {
        Require(double.IsFinite(seconds) && seconds >= camera.FastestShutterSeconds * (1 - 1e-3) && seconds <= camera.SlowestShutterSeconds * (1 + 1e-3),
            FormattableString.Invariant($"{where}: {seconds} s outside {camera.FastestShutterSeconds}–{camera.SlowestShutterSeconds} s"));
    }

    /// <summary>A photo plan's rows: inside the visible eclipse, finite, exposures settable, sky warnings by the Sun.</summary>
    public static void PhotoPlan(PhotoPlan plan, PhotoPlanResponse response)
    {
        var local = plan.Local;
        var sky = new LocalSky(local.Eclipse.NightSky, local.Site, local.DeltaTSeconds);
        var whole = local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();
        foreach (var row in plan.Timeline)
        {
            Require(whole.Any(s => s.StartTt.SecondsSince(row.Tt) <= 1e-3 && row.Tt.SecondsSince(s.EndTt) <= 1e-3), $"row {row.Contact} outside the visible eclipse");
            Require(double.IsFinite(row.BrightnessStops) && double.IsFinite(row.LimbStops) && double.IsFinite(row.DiscStops), "non-finite brightness");
            ShutterInRange(row.Exposure.ShutterSeconds, plan.Camera, "shutter");
            foreach (var t in row.Exposure.BracketShutters) ShutterInRange(t, plan.Camera, "bracket");
            var sun = sky.SunAltitudeAt(local.Eclipse.NightSky.HoursFromCenter(row.Tt)).Degrees;
            Require(row.Warnings.Any(w => w.Code == PhotoWarningCode.Daylight) == sun > -50.0 / 60, $"daylight warning with the Sun at {sun:0.##}°");
            Require(row.Warnings.Any(w => w.Code == PhotoWarningCode.TwilightSky) == (sun <= -50.0 / 60 && sun > -12), $"twilight warning with the Sun at {sun:0.##}°");
            Require(row.Warnings.All(w => w.Numbers.Values.All(double.IsFinite)), "non-finite warning number");
            if (row.Contact is "U2") Require(row.Phase == MoonPhaseState.Total, "U2 row not total");
            if (row.Contact is "U1" or "U3") Require(row.Phase == MoonPhaseState.Partial, $"{row.Contact} row not partial");
        }
        foreach (var row in response.Timeline)
        {
            LocalIsUtcPlusOffset(row.Utc, row.Local, local.Site.TimeZone);
            ShutterInRange(row.Exposure.ShutterSeconds, plan.Camera, "wire shutter");
            foreach (var t in row.Exposure.BracketShutterSeconds) ShutterInRange(t, plan.Camera, "wire bracket");
            // As a camera sets it: a third-stop ISO (ISO 12232's series from 25; a marking lies within 0.1 third of the
            // speed it stands for, 1250 for 1270), a marked or bulb time a sixth of a stop
            // from the camera's range at most, and the computed exposure within a sixth of a stop (rounded to 0.01 on the
            // wire) unless the ISO series' ends forced more.
            var settable = row.Exposure.Settable;
            var isoThirds = 3 * Math.Log2(settable.Iso / 100);
            Require(settable.Iso >= 25 && settable.Iso <= 409600 && Math.Abs(isoThirds - Math.Round(isoThirds)) < 0.1, $"ISO {settable.Iso} is not a third stop");
            Require(settable.ShutterSeconds >= plan.Camera.FastestShutterSeconds / 1.13 && settable.ShutterSeconds <= plan.Camera.SlowestShutterSeconds * 1.13,
                $"settable shutter {settable.Shutter} outside the camera's range");
            Require(Math.Abs(settable.OffStops) <= 1 / 6.0 + 0.005 || row.Exposure.Iso < 25 * 1.12 || row.Exposure.Iso > 409600 / 1.12,
                $"settable exposure {settable.OffStops} stops from the computed one");
            Require(settable.BracketShutters.Count == row.Exposure.BracketShutterSeconds.Count, "settable bracket length");
        }
        // A run note is given once: no row repeats it, runs lie inside the timeline, and two runs of one code never touch.
        Require(plan.Timeline.All(r => r.Warnings.All(w => !PlanNotes.GroupedCodes.Contains(w.Code))), "a row repeats a run note");
        PlanNote? previous = null;
        foreach (var note in plan.Notes)
        {
            Require(note.Rows >= 1 && note.FirstRow >= 0 && note.FirstRow + note.Rows <= plan.Timeline.Count, "run note outside the timeline");
            Require(note.Numbers.Values.All(double.IsFinite), "non-finite run-note number");
            if (previous is not null && previous.Code == note.Code)
                Require(note.FirstRow > previous.FirstRow + previous.Rows, "two runs of one note touch");
            previous = note;
        }
        foreach (var note in response.Notes)
        {
            LocalIsUtcPlusOffset(note.FromUtc, note.FromLocal, local.Site.TimeZone);
            LocalIsUtcPlusOffset(note.ToUtc, note.ToLocal, local.Site.TimeZone);
        }
    }

    /// <summary>The camera-control sequence: every step's shutter settable.</summary>
    public static int Sequence(string json, Camera camera)
    {
        var steps = JsonDocument.Parse(json).RootElement.EnumerateArray().ToList();
        foreach (var s in steps)
        {
            ShutterInRange(s.GetProperty("shutterSeconds").GetDouble(), camera, "sequence");
            Require(s.GetProperty("settableShutter").GetString()!.EndsWith(" s", StringComparison.Ordinal)
                || s.GetProperty("settableShutter").GetString()!.EndsWith(" s bulb", StringComparison.Ordinal), "sequence settable shutter label");
            Require(s.GetProperty("settableIso").GetDouble() >= 25, "sequence settable ISO");
        }
        return steps.Count;
    }

    public static void Require(bool condition, string message)
    {
        if (!condition) throw new SweepFailure(message);
    }
}

/// <summary>An invariant that did not hold.</summary>
internal sealed class SweepFailure(string message) : Exception(message);
