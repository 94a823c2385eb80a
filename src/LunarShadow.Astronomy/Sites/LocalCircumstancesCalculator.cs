using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Sites;

/// <summary>
/// Local circumstances: the global eclipse seen from one site, clipped to when the Moon stands above the horizon,
/// the horizon profile and the minimum altitude. Works on the eclipse's fitted night, so it costs microseconds.
/// </summary>
public static class LocalCircumstancesCalculator
{
    /// <summary>Events are reported within this many hours of greatest eclipse.</summary>
    public const double EventWindowHours = 12.0;

    /// <summary>The circumstances of an eclipse at a site, with UTC from the given time scales.</summary>
    public static LocalCircumstances Compute(LunarEclipse eclipse, Site site, TimeScaleConverter time)
    {
        var deltaT = time.DeltaTAt(eclipse.GreatestEclipse).Seconds;
        var toUtc = NightClock.For(eclipse, time);
        var sky = new LocalSky(eclipse.NightSky, site, deltaT);
        var night = eclipse.NightSky;
        double HoursOf(TtInstant tt) => night.HoursFromCenter(tt);

        var dip = site.HorizonDip.Radians;
        var minimum = site.MinimumAltitude.Radians;
        double AboveSeaHorizon(double limb, double azimuth) => limb + dip;
        double AboveProfile(double limb, double azimuth) => limb - Math.Max(site.Horizon.AltitudeAt(Angle.FromRadians(azimuth)).Radians, -dip);
        double Visibility(double limb, double azimuth) =>
            limb - Math.Max(Math.Max(site.Horizon.AltitudeAt(Angle.FromRadians(azimuth)).Radians, minimum), -dip);

        const double w = EventWindowHours;
        var scan = new AltitudeCrossings(sky, -w, w);
        var events = new List<MoonEvent>();
        var seaCrossings = scan.Find(AboveSeaHorizon, HorizonProfile.Flat);
        foreach (var (h, rising) in seaCrossings) events.Add(Event(rising ? MoonEventType.Rise : MoonEventType.Set, h));
        if (!site.Horizon.IsFlat)
        {
            foreach (var (h, rising) in scan.Find(AboveProfile, site.Horizon))
                events.Add(Event(rising ? MoonEventType.ClearsHorizonProfile : MoonEventType.HiddenByHorizonProfile, h));
        }
        events.Sort((a, b) => a.Tt.CompareTo(b.Tt));
        var horizonState = seaCrossings.Count > 0 ? MoonHorizonState.RisesOrSets
            : scan.AtStart(AboveSeaHorizon) >= 0 ? MoonHorizonState.UpThroughout : MoonHorizonState.DownThroughout;

        // With a flat horizon and no minimum above it, visibility is the sea horizon itself.
        var visibilityCrossings = site.Horizon.IsFlat && minimum <= -dip ? seaCrossings : scan.Find(Visibility, site.Horizon);
        var visibleSpans = scan.PositiveSpans(Visibility, visibilityCrossings);
        var phases = new List<VisibleSpan>();
        AddPhase(EclipsePhase.Penumbral, ContactName.P1, ContactName.P4);
        AddPhase(EclipsePhase.Partial, ContactName.U1, ContactName.U4);
        AddPhase(EclipsePhase.Total, ContactName.U2, ContactName.U3);

        var contacts = new List<LocalContact>();
        foreach (var m in eclipse.Moments) contacts.Add(Contact(m.Contact, m.Tt, m.PositionAngle));

        var best = LargestVisibleMagnitude(eclipse, sky, phases, toUtc);
        return new LocalCircumstances(site, eclipse, deltaT, contacts, events, horizonState, phases, best);

        MoonEvent Event(MoonEventType type, double h)
        {
            var tt = night.InstantAt(h);
            return new MoonEvent(type, tt, toUtc(tt), sky.MoonAt(h).Azimuth.Degrees);
        }

        void AddPhase(EclipsePhase phase, ContactName start, ContactName end)
        {
            if (eclipse.Contact(start) is not { } a || eclipse.Contact(end) is not { } b) return;
            var (ha, hb) = (HoursOf(a.Tt), HoursOf(b.Tt));
            foreach (var (s, e) in visibleSpans)
            {
                var from = Math.Max(s, ha);
                var to = Math.Min(e, hb);
                if (to <= from) continue;
                var (ttFrom, ttTo) = (night.InstantAt(from), night.InstantAt(to));
                // Where a span ends at a contact, use the contact's own instant so the two agree exactly.
                if (from == ha) ttFrom = a.Tt;
                if (to == hb) ttTo = b.Tt;
                phases.Add(new VisibleSpan(phase, ttFrom, ttTo, toUtc(ttFrom), toUtc(ttTo)));
            }
        }

        LocalContact Contact(ContactName? name, TtInstant tt, Angle? positionAngle)
        {
            var h = HoursOf(tt);
            var moon = sky.MoonAt(h);
            var sun = sky.SunAltitudeAt(h);
            Angle? zenith = positionAngle is { } pa ? (pa - moon.ParallacticAngle).NormalizedPositive() : null;
            var visible = Visibility(moon.UpperLimbApparentAltitude.Radians, moon.Azimuth.Radians) >= -1e-9
                || visibleSpans.Any(span => span.Start - 1e-6 <= h && h <= span.End + 1e-6);
            return new LocalContact(name, tt, toUtc(tt), moon, visible, sun, SkyStates.FromSunAltitude(sun), zenith);
        }
    }

    // The umbral magnitude rises to its greatest value and falls again, so its largest visible value is at greatest
    // eclipse when that is visible, otherwise at the visible moment nearest to it.
    private static GreatestVisibleMagnitude? LargestVisibleMagnitude(LunarEclipse eclipse, LocalSky sky, List<VisibleSpan> phases, Func<TtInstant, NodaTime.Instant> toUtc)
    {
        var whole = phases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();
        if (whole.Count == 0) return null;
        var greatest = eclipse.GreatestEclipse;
        var tt = whole.Any(p => p.StartTt <= greatest && greatest <= p.EndTt)
            ? greatest
            : whole.SelectMany(p => new[] { p.StartTt, p.EndTt }).MinBy(t => Math.Abs(t.SecondsSince(greatest)));
        var passage = eclipse.Passage;
        var g = passage.At(passage.HoursFromCenter(tt));
        var radii = ShadowCrossSection.RadiiTowardMoon(eclipse.Model, g);
        var s = g.MoonSemiDiameter.Radians;
        var magnitude = tt == greatest ? eclipse.UmbralMagnitude : ShadowCrossSection.Magnitude(radii.Umbra.Radians, s, g.Separation.Radians);
        var altitude = sky.MoonAt(sky.Night.HoursFromCenter(tt)).ApparentAltitude;
        return new GreatestVisibleMagnitude(magnitude, tt, toUtc(tt), altitude);
    }
}
