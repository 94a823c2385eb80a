using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Photography;

/// <summary>Turns a photo plan into its representations.</summary>
internal static class PhotoMapping
{
    public static PhotoPlanResponse ToResponse(PhotoPlan plan, TimeScaleConverter time)
    {
        var local = LocalMapping.ToResponse(plan.Local, time, null);
        var zone = plan.Local.Site.TimeZone;
        var c = plan.Camera;
        var f = plan.Framing;
        var s = plan.Sequences;
        return new PhotoPlanResponse(
            local.Site, local.Eclipse, local.Night,
            new CameraEcho(c.SensorWidthMm, c.SensorHeightMm, TimeFormats.Round(c.PixelPitchMicrons, 3), c.EffectiveFocalLengthMm, c.EffectiveAperture,
                c.ShutterSeconds is null ? c.Iso : null, c.ShutterSeconds, PhotoParameters.Mounts.First(m => m.Value == c.Mount).Key, c.FastestShutterSeconds, c.SlowestShutterSeconds),
            local.Summary,
            new BrightnessModelEcho(plan.Settings.Danjon, TimeFormats.Round(plan.ExtinctionPerAirMass, 4), plan.UncertaintyStops, SiteWording.BrightnessModelNote),
            plan.Timeline.Select(r => new TimelineRowResponse(
                TimeFormats.Utc(r.Utc), TimeFormats.Local(r.Utc, zone).Text, r.Contact, WireNames.Of(r.Phase),
                TimeFormats.Round(r.UmbralFraction, 4), TimeFormats.Round(r.PenumbralFraction, 4),
                TimeFormats.Round(r.Altitude.Degrees, 2), TimeFormats.Round(r.Azimuth.Degrees, 2), TimeFormats.Round(r.AirMass, 3),
                TimeFormats.Round(r.BrightnessStops, 2), TimeFormats.Round(r.LimbStops, 2), TimeFormats.Round(r.DiscStops, 2),
                new ExposureResponse(Seconds(r.Exposure.ShutterSeconds), Math.Round(r.Exposure.Iso), r.Exposure.Aperture, TimeFormats.Round(r.Exposure.Ev100, 2),
                    plan.Settings.BracketStops, r.Exposure.BracketShutters.Select(Seconds).ToList(), Settable(r.Exposure, c)),
                r.Warnings.Select(PhotoWarningText.Sentence).ToList(),
                r.Warnings.Select(w => new WarningResponse(WireNames.Of(w.Code), w.Numbers.ToDictionary(n => n.Key, n => TimeFormats.Round(n.Value, 4)))).ToList())).ToList(),
            new FramingResponse(TimeFormats.Round(f.FieldWidth.Degrees, 3), TimeFormats.Round(f.FieldHeight.Degrees, 3), TimeFormats.Round(f.MoonDiameterPixels, 1),
                TimeFormats.Round(f.MoonFractionOfFrameHeight, 4), f.TrailingLimitSeconds is { } t ? Seconds(t) : null,
                Seconds(f.FixedTripodLimitSeconds), Seconds(f.SiderealLimitSeconds), f.MinutesInFixedFrame),
            s is null ? null : new SequencesResponse(
                new CompositeResponse(TimeFormats.Round(s.CompositeIntervalSeconds, 1), s.CompositeExposures, TimeFormats.Round(s.PathWidth.Degrees, 2),
                    TimeFormats.Round(s.PathHeight.Degrees, 2), s.FitsLandscape, s.FitsPortrait, TimeFormats.Round(s.AimAzimuth.Degrees, 2), TimeFormats.Round(s.AimAltitude.Degrees, 2)),
                new TimeLapseResponse(s.TimeLapseIntervalSeconds, s.TimeLapseFrames, TimeFormats.Round(s.TimeLapseMinutes, 1),
                    TimeFormats.Round(s.TimeLapsePlaybackSeconds, 1), TimeFormats.Round(s.TimeLapseStorageGigabytes, 2))),
            plan.Cautions,
            plan.Notes.Select(n => new PlanNoteResponse(WireNames.Of(n.Code), PhotoWarningText.NoteSentence(n, zone),
                TimeFormats.Utc(n.FromUtc), TimeFormats.Utc(n.ToUtc), TimeFormats.Local(n.FromUtc, zone).Text, TimeFormats.Local(n.ToUtc, zone).Text,
                n.FirstRow, n.Rows, n.Numbers.ToDictionary(x => x.Key, x => TimeFormats.Round(x.Value, 4)))).ToList());
    }

    private static SettableExposureResponse Settable(Exposure exposure, Camera camera)
    {
        var s = SettableExposure.For(exposure, camera);
        return new SettableExposureResponse(s.ShutterLabel, Seconds(s.ShutterSeconds), s.Iso, TimeFormats.Round(s.OffStops, 2), s.BracketLabels);
    }

    public static string Csv(PhotoPlanResponse r)
    {
        var csv = new CsvWriter().Row("utc", "local", "contact", "phase", "umbral_fraction", "penumbral_fraction", "moon_altitude_deg", "moon_azimuth_deg",
            "airmass", "brightness_stops", "shutter_s", "iso", "aperture", "bracket_stops", "warnings", "local_date",
            "settable_shutter", "settable_iso", "settable_off_stops");
        foreach (var (row, i) in r.Timeline.Select((row, i) => (row, i)))
            csv.Row(row.Utc, row.Local, row.Contact, row.Phase, row.UmbralFraction, row.PenumbralFraction, row.MoonAltitudeDegrees, row.MoonAzimuthDegrees,
                row.Airmass, row.BrightnessStops, row.Exposure.ShutterSeconds, row.Exposure.Iso, row.Exposure.Aperture, row.Exposure.BracketStops,
                string.Join("; ", row.Warnings.Concat(NotesStartingAt(r, i))), r.Night.Evening,
                row.Exposure.Settable.Shutter, row.Exposure.Settable.Iso, row.Exposure.Settable.OffStops);
        return csv.ToString();
    }

    /// <summary>
    /// Every exposure of every bracket, in time order: what a camera-control script steps through. A note for a run of
    /// rows rides on the first step of the run's first row.
    /// </summary>
    public static List<SequenceStep> Sequence(PhotoPlanResponse r) => r.Timeline
        .SelectMany((row, i) => row.Exposure.BracketShutterSeconds.Select((t, k) =>
            new SequenceStep(row.Utc, t, row.Exposure.Iso, row.Exposure.Aperture, k == 0 && NotesStartingAt(r, i).Any() ? string.Join("; ", NotesStartingAt(r, i)) : null,
                row.Exposure.Settable.BracketShutters[k], row.Exposure.Settable.Iso)))
        .ToList();

    // The words of the run notes that start at a timeline row: each note is written once, at its run's first row.
    private static IEnumerable<string> NotesStartingAt(PhotoPlanResponse r, int row) => r.Notes.Where(n => n.FirstRow == row).Select(n => n.Text);

    // Shutter times to four significant figures.
    private static double Seconds(double t) => t <= 0 ? 0 : Math.Round(t, Math.Max(0, 3 - (int)Math.Floor(Math.Log10(t))));
}
