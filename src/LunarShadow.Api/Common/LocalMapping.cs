using LunarShadow.Api.Formatting;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Api.Common;

/// <summary>Turns local circumstances into contracts, CSV and iCalendar.</summary>
internal static class LocalMapping
{
    public static LocalResponse ToResponse(LocalCircumstances l, TimeScaleConverter time, PublicNightPlan? plan)
    {
        var zone = l.Site.TimeZone;
        string Local(Instant i) => TimeFormats.Local(i, zone).Text;
        var deltaT = time.DeltaTAt(l.Eclipse.GreatestEclipse);
        var night = l.Outline.Night;
        return new LocalResponse(
            Echo(l.Site, LocalDates.Abbreviations(night, zone)),
            new EclipseBrief(TimeFormats.UtcDate(time.ToUtc(l.Eclipse.GreatestEclipse)), WireNames.Of(l.Eclipse.Kind),
                TimeFormats.Utc(time.ToUtc(l.Eclipse.GreatestEclipse)), TimeFormats.Round(l.Eclipse.UmbralMagnitude, 5), l.Eclipse.Model.Name),
            Night(night),
            TimeFormats.Round(deltaT.Seconds, 1),
            TimeFormats.Round(deltaT.UncertaintySeconds, 1),
            l.Contacts.Select(c =>
            {
                var (local, note) = TimeFormats.Local(c.Utc, zone);
                return new LocalContactResponse(c.Label, TimeFormats.Utc(c.Utc), local, note,
                    TimeFormats.Round(c.Moon.ApparentAltitude.Degrees, 2), TimeFormats.Round(c.Moon.Azimuth.Degrees, 2), c.Visible,
                    TimeFormats.Round(c.SunAltitude.Degrees, 2), WireNames.Of(c.Sky),
                    c.ZenithPositionAngle is { } z ? TimeFormats.Round(z.Degrees, 1) : null);
            }).ToList(),
            l.MoonEvents.Select(e => new MoonEventResponse(WireNames.Of(e.Type), TimeFormats.Utc(e.Utc), Local(e.Utc), TimeFormats.Round(e.Azimuth, 2))).ToList(),
            WireNames.Of(l.HorizonState),
            l.VisiblePhases.Select(p => Phase(p, zone)).ToList(),
            TimeFormats.Round(l.VisibleMinutes(EclipsePhase.Total), 2),
            l.GreatestVisibleUmbralMagnitude is { } m
                ? new VisibleMagnitudeResponse(TimeFormats.Round(m.Value, 4), TimeFormats.Utc(m.Utc), Local(m.Utc), TimeFormats.Round(m.Altitude.Degrees, 2))
                : null,
            SiteWording.Summary(l),
            plan is null ? null : new PublicNightResponse(Local(plan.Window.Opens), Local(plan.Window.Closes),
                TimeFormats.Utc(plan.Window.Opens), TimeFormats.Utc(plan.Window.Closes),
                plan.PhasesInWindow.Select(p => Phase(p, zone)).ToList(),
                plan.Session is { } s ? new SessionResponse(Local(s.DoorsOpen), Local(s.DoorsClose), TimeFormats.Utc(s.DoorsOpen), TimeFormats.Utc(s.DoorsClose),
                    TimeFormats.Round(s.MoonAltitudeAtOpen.Degrees, 1), TimeFormats.Round(s.MoonAltitudeAtClose.Degrees, 1)) : null,
                SiteWording.PublicNightNote(plan, l)),
            SiteWording.Cautions(l));
    }

    /// <summary>The Moon's and Sun's altitude every few minutes over 8 hours either side of greatest eclipse.</summary>
    public static List<TrackPointResponse> Track(LocalCircumstances l, double stepMinutes, TimeScaleConverter time)
    {
        var sky = new LocalSky(l.Eclipse.NightSky, l.Site, l.DeltaTSeconds);
        var toUtc = NightClock.For(l.Eclipse, time);
        var points = new List<TrackPointResponse>();
        for (var minutes = -480.0; minutes <= 480.0 + 1e-9; minutes += stepMinutes)
        {
            var h = minutes / 60;
            var moon = sky.MoonAt(h);
            var utc = toUtc(sky.InstantAt(h));
            var sun = sky.SunAltitudeAt(h);
            points.Add(new TrackPointResponse(TimeFormats.Utc(utc), TimeFormats.Local(utc, l.Site.TimeZone).Text,
                TimeFormats.Round(moon.ApparentAltitude.Degrees, 2), TimeFormats.Round(moon.Azimuth.Degrees, 2),
                TimeFormats.Round(l.Site.Horizon.AltitudeAt(moon.Azimuth).Degrees, 2), TimeFormats.Round(sun.Degrees, 2),
                WireNames.Of(SkyStates.FromSunAltitude(sun))));
        }
        return points;
    }

    /// <summary>The site as understood, with the zone abbreviations in force on the nights concerned.</summary>
    public static SiteEcho Echo(Site site, IReadOnlyList<string> abbreviations) => new(
        site.Name,
        site.Location.Latitude.Degrees,
        site.Location.Longitude.Degrees,
        site.Location.ElevationMeters,
        site.TimeZone.Id,
        abbreviations,
        site.MinimumAltitude.Degrees,
        site.Horizon.Points.Select(p => new HorizonPointResponse(p.Azimuth, p.Altitude)).ToList(),
        site.TimeZone == DateTimeZone.Utc ? SiteWording.UtcHint : null);

    /// <summary>A night by its local dates.</summary>
    public static NightResponse Night(LocalNight night) => new(LocalDates.Iso(night.Evening), LocalDates.Iso(night.Morning));

    public static VisiblePhaseResponse Phase(VisibleSpan p, DateTimeZone zone) => new(
        WireNames.Of(p.Phase), TimeFormats.Utc(p.StartUtc), TimeFormats.Utc(p.EndUtc),
        TimeFormats.Local(p.StartUtc, zone).Text, TimeFormats.Local(p.EndUtc, zone).Text, TimeFormats.Round(p.Minutes, 2));

}
