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
        return new LocalResponse(
            Echo(l.Site),
            new EclipseBrief(TimeFormats.UtcDate(time.ToUtc(l.Eclipse.GreatestEclipse)), WireNames.Of(l.Eclipse.Kind),
                TimeFormats.Utc(time.ToUtc(l.Eclipse.GreatestEclipse)), TimeFormats.Round(l.Eclipse.UmbralMagnitude, 5), l.Eclipse.Model.Name),
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
            l.MaxVisibleUmbralMagnitude is { } m
                ? new VisibleMagnitudeResponse(TimeFormats.Round(m.Value, 4), TimeFormats.Utc(m.Utc), Local(m.Utc), TimeFormats.Round(m.Altitude.Degrees, 2))
                : null,
            l.Summary,
            plan is null ? null : new PublicNightResponse(Local(plan.Window.Opens), Local(plan.Window.Closes),
                plan.PhasesInWindow.Select(p => Phase(p, zone)).ToList(),
                plan.Session is { } s ? new SessionResponse(Local(s.DoorsOpen), Local(s.DoorsClose),
                    TimeFormats.Round(s.MoonAltitudeAtOpen.Degrees, 1), TimeFormats.Round(s.MoonAltitudeAtClose.Degrees, 1)) : null,
                plan.Note),
            Cautions(l));
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
            points.Add(new TrackPointResponse(TimeFormats.Utc(utc), TimeFormats.Local(utc, l.Site.TimeZone).Text,
                TimeFormats.Round(moon.ApparentAltitude.Degrees, 2), TimeFormats.Round(moon.Azimuth.Degrees, 2),
                TimeFormats.Round(l.Site.Horizon.AltitudeAt(moon.Azimuth).Degrees, 2), TimeFormats.Round(sky.SunAltitudeAt(h).Degrees, 2)));
        }
        return points;
    }

    public static SiteEcho Echo(Site site) => new(
        site.Name,
        site.Location.Latitude.Degrees,
        site.Location.Longitude.Degrees,
        site.Location.ElevationMeters,
        site.TimeZone.Id,
        site.MinimumAltitude.Degrees,
        site.Horizon.Points.Select(p => new HorizonPointResponse(p.Azimuth, p.Altitude)).ToList(),
        site.TimeZone == DateTimeZone.Utc ? "No time zone given: local times are in UTC. Pass tz=Area/City (IANA), e.g. tz=Europe/Vienna." : null);

    public static VisiblePhaseResponse Phase(VisibleSpan p, DateTimeZone zone) => new(
        WireNames.Of(p.Phase), TimeFormats.Utc(p.StartUtc), TimeFormats.Utc(p.EndUtc),
        TimeFormats.Local(p.StartUtc, zone).Text, TimeFormats.Local(p.EndUtc, zone).Text, TimeFormats.Round(p.Minutes, 2));

    // Common practice for eclipse outreach: warn about the Sun whenever it is up or just set (or about to rise) while
    // the eclipsed Moon is low on the opposite horizon, and about the dark for every visible night-time eclipse.
    private static List<string> Cautions(LocalCircumstances l)
    {
        var cautions = new List<string>();
        if (l.Contacts.Any(c => c.Visible && c.SunAltitude.Degrees > -6))
            cautions.Add("The Sun is up or only just below the horizon, opposite the Moon, during part of the visible eclipse: never point binoculars, telescopes or camera lenses near it, and keep optics capped while turning.");
        if (l.AnyVisible)
            cautions.Add("Observing at night: choose a site you can reach and leave safely in the dark, watch for traffic and uneven ground, dress for the cold, and follow local rules for access and lights.");
        return cautions;
    }
}
