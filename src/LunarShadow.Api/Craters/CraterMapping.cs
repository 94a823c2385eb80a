using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Craters;

/// <summary>Turns feature crossings into the response contract, adding what a site sees of each crossing.</summary>
internal static class CraterMapping
{
    public static CraterTimingsResponse ToResponse(FeatureShadowCrossings crossings, IReadOnlyList<FeatureTiming> timings, TimeScaleConverter time, Site? site, bool penumbra)
    {
        var eclipse = crossings.Eclipse;
        var deltaT = time.DeltaTAt(eclipse.GreatestEclipse);
        var toUtc = NightClock.For(eclipse, time);
        var uncertainty = TimeFormats.Round(deltaT.UncertaintySeconds, 1);

        // A site adds only visibility: the Moon's altitude, the sky, and whether the Moon is up within the visible
        // stretches the local circumstances already found (every crossing lies between P1 and P4).
        LocalCircumstances? local = site is null ? null : LocalCircumstancesCalculator.Compute(eclipse, site, time);
        var sky = local is null ? null : new LocalSky(eclipse.NightSky, local.Site, local.DeltaTSeconds);
        var visibleSpans = local?.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();

        CrossingResponse? Crossing(FeatureCrossing? c)
        {
            if (c is null) return null;
            var utc = toUtc(c.Tt);
            var response = new CrossingResponse(TimeFormats.Utc(utc), TimeFormats.Tt(c.Tt), uncertainty,
                TimeFormats.Round(c.PositionAngle.Degrees, 1), c.FacesEarth);
            if (sky is null || site is null) return response;
            var h = eclipse.NightSky.HoursFromCenter(c.Tt);
            var moon = sky.MoonAt(h);
            var visible = visibleSpans!.Any(s => s.StartTt.SecondsSince(c.Tt) <= 1 && c.Tt.SecondsSince(s.EndTt) <= 1);
            return response with
            {
                Local = TimeFormats.Local(utc, site.TimeZone).Text,
                Visible = visible,
                MoonAltitudeDegrees = TimeFormats.Round(moon.ApparentAltitude.Degrees, 2),
                Sky = WireNames.Of(SkyStates.FromSunAltitude(sky.SunAltitudeAt(h))),
                ZenithPositionAngleDegrees = TimeFormats.Round((c.PositionAngle - moon.ParallacticAngle).NormalizedPositive().Degrees, 1),
            };
        }

        AxisOffsetResponse AtGreatest(LunarFeature feature)
        {
            var (east, north, facesEarth) = crossings.OffsetFromAxisAt(feature, eclipse.GreatestEclipse);
            return new AxisOffsetResponse(TimeFormats.Round(east.Degrees, 5), TimeFormats.Round(north.Degrees, 5), facesEarth);
        }

        var ordered = timings.Where(t => t.ReachedByUmbra).OrderBy(t => t.UmbraImmersion!.Tt)
            .Concat(timings.Where(t => !t.ReachedByUmbra))
            .Select(t => new CraterTimingResponse(t.Feature.Name,
                TimeFormats.Round(t.Feature.Location.Latitude.Degrees, 2), TimeFormats.Round(t.Feature.Location.Longitude.Degrees, 2),
                t.ReachedByUmbra, Crossing(t.UmbraImmersion), Crossing(t.UmbraEmersion),
                penumbra ? Crossing(t.PenumbraImmersion) : null, penumbra ? Crossing(t.PenumbraEmersion) : null,
                AtGreatest(t.Feature)))
            .ToList();

        return new CraterTimingsResponse(
            TimeFormats.UtcDate(time.ToUtc(eclipse.GreatestEclipse)),
            WireNames.Of(eclipse.Kind),
            eclipse.Model.Name,
            eclipse.Model.Kind == ShadowModelKind.Layer ? eclipse.Model.LayerHeightKm : null,
            time.DeltaTModel.Name,
            TimeFormats.Round(deltaT.Seconds, 1),
            uncertainty,
            site is null ? null : new CraterSiteResponse(site.Name, site.Location.Latitude.Degrees, site.Location.Longitude.Degrees, site.TimeZone.Id),
            LunarFeatureCatalog.Source,
            ordered.Count(t => t.ReachedByUmbra),
            ordered,
            EmbeddedDataSet.VersionTag);
    }
}
