using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Tests.Eclipses;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Tests.Photography;

public class PhotoPlanTests
{
    // An invented site: the Fernbrook Meadow field station of a photographer's club (40.71 N, 74.00 W).
    private static readonly Site Fernbrook = Site.At(40.71, -74.0, 0, DateTimeZoneProviders.Tzdb["America/New_York"]) with { Name = "Fernbrook Meadow" };
    private static readonly Camera Telephoto = new(36, 24, 4.3, 400, 1, Mount.FixedTripod, 400, 8);

    private static PhotoPlan Plan(Camera? camera = null) =>
        PhotoPlanner.Plan(EclipseOnDate.Find(2025, 3, 14), Fernbrook, camera ?? Telephoto, new PhotoSettings(), TimeScaleConverter.Default);

    [Fact]
    public void The_timeline_agrees_with_the_local_circumstances()
    {
        var plan = Plan();
        var local = plan.Local;
        foreach (var contact in local.Contacts.Where(c => c.Visible))
        {
            var row = plan.Timeline.Single(r => r.Contact == contact.Label);
            Assert.Equal(contact.Utc, row.Utc);
            Assert.Equal(contact.Moon.ApparentAltitude.Degrees, row.Altitude.Degrees, 9);
        }
        var spans = local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();
        Assert.All(plan.Timeline, r => Assert.Contains(spans, s => s.StartTt.SecondsSince(r.Tt) <= 1e-3 && r.Tt.SecondsSince(s.EndTt) <= 1e-3));
        var u2 = local.Eclipse.Contact(ContactName.U2)!.Tt;
        var u3 = local.Eclipse.Contact(ContactName.U3)!.Tt;
        Assert.All(plan.Timeline.Where(r => r.Tt > u2 && r.Tt < u3), r => Assert.Equal(MoonPhaseState.Total, r.Phase));
        Assert.All(plan.Timeline.Where(r => r.Phase == MoonPhaseState.Total), r => Assert.Equal(1, r.UmbralFraction, 9));
        // Rows every 5 minutes across about six hours, plus the seven contacts.
        Assert.InRange(plan.Timeline.Count, 70, 80);
    }

    // Common practice: the Moon darkens steadily from U1 to U2 and brightens from U3 to U4.
    [Fact]
    public void Brightness_falls_from_U1_to_U2_and_rises_from_U3_to_U4()
    {
        var plan = Plan();
        var e = plan.Local.Eclipse;
        var falling = plan.Timeline.Where(r => r.Tt >= e.Contact(ContactName.U1)!.Tt && r.Tt <= e.Contact(ContactName.U2)!.Tt).ToList();
        var rising = plan.Timeline.Where(r => r.Tt >= e.Contact(ContactName.U3)!.Tt && r.Tt <= e.Contact(ContactName.U4)!.Tt).ToList();
        for (var i = 1; i < falling.Count; i++) Assert.True(falling[i].LimbStops <= falling[i - 1].LimbStops && falling[i].DiscStops <= falling[i - 1].DiscStops);
        for (var i = 1; i < rising.Count; i++) Assert.True(rising[i].LimbStops >= rising[i - 1].LimbStops && rising[i].DiscStops >= rising[i - 1].DiscStops);
    }

    // Common practice (a note is read once): at ISO 100 and f/8 totality needs more than the 30 s slowest shutter, so the
    // ISO is raised for as long as the light stays that low. That change is stated once per contiguous run of rows with
    // the run's first and last rows, never repeated on each row.
    [Fact]
    public void An_ISO_change_is_noted_once_per_contiguous_run_of_rows()
    {
        var camera = Telephoto with { Mount = Mount.LunarTracking, Iso = 100, Aperture = 8 };
        var plan = Plan(camera);
        Assert.DoesNotContain(plan.Timeline, r => r.Warnings.Any(w => w.Code == PhotoWarningCode.IsoChanged));
        var changed = plan.Timeline.Select(r => r.Exposure.Iso != camera.Iso).ToList();
        var runs = new List<(int First, int Last)>();
        for (var i = 0; i < changed.Count; i++)
            if (changed[i] && (i == 0 || !changed[i - 1])) runs.Add((i, changed.FindIndex(i, c => !c) is var end and >= 0 ? end - 1 : changed.Count - 1));
        Assert.NotEmpty(runs);
        var notes = plan.Notes.Where(n => n.Code == PhotoWarningCode.IsoChanged).ToList();
        Assert.Equal(runs.Count, notes.Count);
        foreach (var (note, run) in notes.Zip(runs))
        {
            Assert.Equal(run.First, note.FirstRow);
            Assert.Equal(run.Last - run.First + 1, note.Rows);
            Assert.Equal(plan.Timeline[run.First].Utc, note.FromUtc);
            Assert.Equal(plan.Timeline[run.Last].Utc, note.ToUtc);
            Assert.Equal(100, note.Numbers["fromIso"]);
            var isos = plan.Timeline.Skip(run.First).Take(note.Rows).Select(r => r.Exposure.Iso).ToList();
            Assert.Equal(isos.Min(), note.Numbers["lowestIso"]);
            Assert.Equal(isos.Max(), note.Numbers["highestIso"]);
        }
        Assert.Contains(plan.Timeline.Skip(notes[0].FirstRow).Take(notes[0].Rows), r => r.Phase == MoonPhaseState.Total);
    }

    // H. C. Vital, "Understanding REA's observations of the total lunar eclipse of February 20–21, 2008": observers' mean
    // Danjon L = 3.0 ± 0.1 and V = −2.8 ± 0.3 at mid-totality, against the mean full Moon's V = −12.74 (common practice):
    // 9.94 mag = 13.2 stops below the full Moon. Planned for that L from Fernbrook (the Moon high in the evening sky),
    // the deepest disc must lie there within the model's stated 1.5 stops and the observations' 0.4 stop.
    [Fact]
    public void The_deepest_totality_matches_a_published_eclipse_within_the_stated_uncertainty()
    {
        var plan = PhotoPlanner.Plan(EclipseOnDate.Find(2008, 2, 21), Fernbrook, Telephoto, new PhotoSettings(Danjon: 3.0), TimeScaleConverter.Default);
        var publishedStops = -(-2.8 + 12.74) / (2.5 * Math.Log10(2));
        Assert.Equal(publishedStops, plan.Timeline.Min(r => r.DiscStops), UmbralGlow.UncertaintyStops + 0.4);
    }

    [Fact]
    public void A_fixed_tripod_at_400_mm_warns_of_trailing_in_totality_and_asks_to_re_aim()
    {
        var plan = Plan();
        Assert.Contains(plan.Timeline.Where(r => r.Phase == MoonPhaseState.Total), r => r.Warnings.Any(w => w.Code == PhotoWarningCode.Trailing));
        Assert.Contains(plan.Timeline, r => r.Warnings.Any(w => w.Code == PhotoWarningCode.LeavingFrame));
        Assert.InRange(plan.Framing.MinutesInFixedFrame, 5, 15);
        var tracked = Plan(Telephoto with { Mount = Mount.LunarTracking });
        Assert.Null(tracked.Framing.TrailingLimitSeconds);
        Assert.DoesNotContain(tracked.Timeline, r => r.Warnings.Any(w => w.Code is PhotoWarningCode.Trailing or PhotoWarningCode.LeavingFrame));
    }

    // Common practice: the Moon crosses the sky at about 15″/s, so discs spaced by a quarter diameter (about 0.65°)
    // need a few minutes between exposures; a 14 mm lens holds the whole six-hour path, a 400 mm lens does not.
    [Fact]
    public void Sequences_plan_a_multi_exposure_and_a_time_lapse()
    {
        var tele = Plan().Sequences!;
        Assert.InRange(tele.CompositeIntervalSeconds, 100, 250);
        Assert.False(tele.FitsLandscape || tele.FitsPortrait);
        var wide = Plan(Telephoto with { FocalLengthMm = 14 }).Sequences!;
        Assert.True(wide.FitsLandscape);
        Assert.InRange(wide.AimAltitude.Degrees, 20, 60);
        Assert.Equal((int)Math.Floor(wide.TimeLapseMinutes * 60 / 10) + 1, wide.TimeLapseFrames);
        Assert.Equal(wide.TimeLapseFrames * 0.03, wide.TimeLapseStorageGigabytes, 9);
    }

    [Fact]
    public void Every_plan_carries_the_safety_cautions()
    {
        var plan = Plan();
        Assert.Contains(plan.Cautions, c => c.Contains("Sun", StringComparison.Ordinal));
        Assert.Contains(plan.Cautions, c => c.Contains("night", StringComparison.OrdinalIgnoreCase));
    }
}
