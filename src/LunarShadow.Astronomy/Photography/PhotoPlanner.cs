using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Photography;

/// <summary>Builds the shooting timeline, framing and sequences for an eclipse, a site and a camera.</summary>
public static class PhotoPlanner
{
    private const double StopsPerMagnitude = 1.3287712379549449; // log₂(10^0.4)
    private const double LowAltitudeDegrees = 10;

    /// <summary>The plan.</summary>
    public static PhotoPlan Plan(LunarEclipse eclipse, Site site, Camera camera, PhotoSettings settings, TimeScaleConverter time) =>
        Plan(LocalCircumstancesCalculator.Compute(eclipse, site, time), camera, settings, time);

    /// <summary>The plan for local circumstances already computed (several cameras at one site share them).</summary>
    public static PhotoPlan Plan(LocalCircumstances local, Camera camera, PhotoSettings settings, TimeScaleConverter time)
    {
        var eclipse = local.Eclipse;
        var site = local.Site;
        var sky = new LocalSky(eclipse.NightSky, site, local.DeltaTSeconds);
        var night = eclipse.NightSky;
        var passage = eclipse.Passage;
        var k = settings.ExtinctionPerAirMass ?? AtmosphericExtinction.CoefficientForHeight(site.Location.ElevationMeters);
        var toUtc = NightClock.For(eclipse, time);

        var visible = local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();
        var framing = Frame(sky, night, camera, settings, visible);
        var rows = new List<TimelineRow>();
        var aimedAt = settings.Start ?? (visible.Count > 0 ? visible[0].StartTt : eclipse.GreatestEclipse);
        foreach (var (tt, label) in RowInstants(local, settings.IntervalMinutes))
            rows.Add(Row(tt, label));
        var sequences = visible.Count == 0 ? null : Sequence(sky, night, camera, settings, visible);
        var (timeline, notes) = PlanNotes.Group(rows);
        return new PhotoPlan(local, camera, settings, k, timeline, framing, sequences, UmbralGlow.UncertaintyStops, Cautions(local), notes);

        TimelineRow Row(TtInstant tt, string? label)
        {
            var h = night.HoursFromCenter(tt);
            var moon = sky.MoonAt(h);
            var g = passage.At(passage.HoursFromCenter(tt));
            var radii = ShadowCrossSection.RadiiTowardMoon(eclipse.Model, g);
            var (d, s) = (g.Separation.Radians, g.MoonSemiDiameter.Radians);
            // A row at a contact belongs to the phase that starts there (at U2 the Moon is just wholly inside the umbra).
            var state = EclipsePhases.At(eclipse, tt) switch
            {
                EclipsePhase.Total => MoonPhaseState.Total,
                EclipsePhase.Partial => MoonPhaseState.Partial,
                EclipsePhase.Penumbral => MoonPhaseState.Penumbral,
                _ => MoonPhaseState.Uneclipsed,
            };
            var umbral = DiscCoverage.FractionInside(radii.Umbra.Radians, s, d);
            var penumbral = Math.Max(0, DiscCoverage.FractionInside(radii.Penumbra.Radians, s, d) - umbral);
            var limb = EclipsedMoonBrightness.SunlitLimb(g, radii, settings.Danjon);
            var disc = EclipsedMoonBrightness.WholeDisc(g, radii, settings.Danjon);
            var airMass = AtmosphericExtinction.AirMass(moon.ApparentAltitude.Degrees);
            var extinctionFactor = Math.Pow(10, -0.4 * k * airMass);
            var target = state == MoonPhaseState.Total ? disc : limb;

            // The uneclipsed Moon at this instant: V from its distances and phase angle, spread over its disc.
            var moonKm = night.MoonKm(h);
            var sunKm = night.SunKm(h);
            var phaseAngle = Angle.FromRadians(Math.Acos(Math.Clamp((-moonKm).Normalized().Dot((sunKm - moonKm).Normalized()), -1, 1))).Degrees;
            var topocentricKm = Frames.BodyDisc.MoonRadiusRatio * Frames.GeodeticLocation.EquatorialRadiusKm / Math.Sin(moon.SemiDiameter.Radians);
            var v = MoonBrightness.VisualMagnitude((sunKm - moonKm).Length, topocentricKm, phaseAngle);
            var luminance = MoonBrightness.Luminance(MoonBrightness.SurfaceBrightness(v, moon.SemiDiameter.Arcseconds)) * target * extinctionFactor;
            var sun = sky.SunAltitudeAt(h).Degrees;
            var skyLuminance = SkyBrightness.Luminance(sun);
            var exposure = ExposureCalculator.For(luminance, camera, settings.BracketStops, skyLuminance);

            var warnings = new List<PhotoWarning>();
            var altitude = moon.ApparentAltitude.Degrees;
            if (altitude < 0) warnings.Add(new PhotoWarning(PhotoWarningCode.MoonBelowHorizon));
            else if (altitude < LowAltitudeDegrees) warnings.Add(Warn(PhotoWarningCode.LowAltitude, ("altitudeDegrees", altitude)));
            if (sun > SkyStates.SunsetAltitude.Degrees) warnings.Add(Warn(PhotoWarningCode.Daylight, ("sunAltitudeDegrees", sun)));
            else if (sun > SkyStates.NauticalTwilightEndAltitude.Degrees) warnings.Add(Warn(PhotoWarningCode.TwilightSky, ("sunAltitudeDegrees", sun), ("skyLuminance", skyLuminance)));
            warnings.AddRange(exposure.Warnings);
            if (framing.TrailingLimitSeconds is { } limit && exposure.ShutterSeconds > limit)
                warnings.Add(Trailing(exposure, limit, camera, framing));
            // On a fixed tripod the photographer re-aims when the Moon nears the frame's edge: warn at the first row
            // past that moment, and count again from there.
            if (camera.Mount == Mount.FixedTripod && tt > aimedAt && tt.SecondsSince(aimedAt) / 60 > framing.MinutesInFixedFrame)
            {
                warnings.Add(Warn(PhotoWarningCode.LeavingFrame, ("minutesInFrame", framing.MinutesInFixedFrame)));
                aimedAt = tt;
            }
            var utc = toUtc(tt);
            return new TimelineRow(tt, utc, label, state, umbral, penumbral, moon.ApparentAltitude, moon.Azimuth, airMass,
                Math.Log2(target * extinctionFactor), Math.Log2(limb), Math.Log2(disc), exposure, warnings);
        }
    }

    private static PhotoWarning Warn(PhotoWarningCode code, params (string Name, double Value)[] numbers) =>
        new(code, numbers.ToDictionary(n => n.Name, n => n.Value));

    // Common practice (blur grows in proportion to exposure time and focal length): an exposure t over the blur limit
    // L is log₂(t/L) stops too long; the ISO × t/L brings it to the limit, a lens of f·L/t keeps the blur in limit at
    // the same exposure (the f-number, not the focal length, sets the Moon's image brightness), and ⌈t/L⌉ frames of L
    // seconds stacked gather the same light; a star-tracking mount has the longer sidereal limit, a Moon-tracking none.
    private static PhotoWarning Trailing(Exposure exposure, double limit, Camera camera, Framing framing) =>
        Warn(PhotoWarningCode.Trailing,
            ("shutterSeconds", exposure.ShutterSeconds), ("limitSeconds", limit), ("excessStops", Math.Log2(exposure.ShutterSeconds / limit)),
            ("isoNeeded", exposure.Iso * exposure.ShutterSeconds / limit),
            ("shorterFocalLengthMm", camera.EffectiveFocalLengthMm * limit / exposure.ShutterSeconds),
            ("stackFrames", Math.Ceiling(exposure.ShutterSeconds / limit - 1e-9)),
            ("siderealLimitSeconds", framing.SiderealLimitSeconds));

    // Rows at every visible contact (and greatest eclipse) and on whole multiples of the interval within the visible part.
    private static IEnumerable<(TtInstant Tt, string? Label)> RowInstants(LocalCircumstances local, double intervalMinutes)
    {
        var rows = new List<(TtInstant, string?)>();
        foreach (var c in local.Contacts.Where(c => c.Visible)) rows.Add((c.Tt, c.Label));
        var step = intervalMinutes * 60;
        foreach (var span in local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral))
        {
            var startSeconds = span.StartUtc.ToUnixTimeTicks() / 1e7;
            var first = Math.Ceiling(startSeconds / step) * step;
            for (var s = first; s < span.EndUtc.ToUnixTimeTicks() / 1e7; s += step)
            {
                var tt = span.StartTt.PlusSeconds(s - startSeconds);
                if (rows.All(r => Math.Abs(r.Item1.SecondsSince(tt)) > 30)) rows.Add((tt, null));
            }
        }
        return rows.OrderBy(r => r.Item1.JulianDate.Day);
    }

    private static Framing Frame(LocalSky sky, EclipseNightSky night, Camera camera, PhotoSettings settings, List<VisibleSpan> visible)
    {
        var f = camera.EffectiveFocalLengthMm;
        var width = Optics.FieldOfView(Math.Max(camera.SensorWidthMm, camera.SensorHeightMm), f);
        var height = Optics.FieldOfView(Math.Min(camera.SensorWidthMm, camera.SensorHeightMm), f);
        var reference = visible.Count > 0 ? night.HoursFromCenter(settings.Start ?? visible[0].StartTt) : 0;
        var moon = sky.MoonAt(reference);
        var diameter = moon.SemiDiameter * 2;
        var diameterPixels = Optics.Pixels(diameter, f, camera.PixelPitchMicrons);

        // The Moon's motion across the sky (fixed tripod) and against the stars (sidereal mount), from the ephemeris.
        const double dtHours = 1.0 / 60;
        var skyRate = AngleBetween(sky.MoonAt(reference), sky.MoonAt(reference + dtHours)) / 60;
        var a = night.MoonKm(reference).Normalized();
        var b = night.MoonKm(reference + dtHours).Normalized();
        var starRate = Math.Atan2(a.Cross(b).Length, a.Dot(b)) / 60;
        var fixedLimit = Optics.BlurLimitSeconds(settings.BlurPixels, camera.PixelPitchMicrons, f, skyRate);
        var siderealLimit = Optics.BlurLimitSeconds(settings.BlurPixels, camera.PixelPitchMicrons, f, starRate);
        double? limit = camera.Mount switch
        {
            Mount.FixedTripod => fixedLimit,
            Mount.SiderealTracking => siderealLimit,
            _ => null,
        };

        // Minutes until the disc leaves a landscape frame aimed at it at the start (1-minute steps, up to 12 hours).
        var minutes = 0.0;
        for (var m = 1; m <= 720; m++)
        {
            var (x, y) = Project(sky.MoonAt(reference), sky.MoonAt(reference + m / 60.0));
            if (Math.Abs(x) + moon.SemiDiameter.Radians > width.Radians / 2 || Math.Abs(y) + moon.SemiDiameter.Radians > height.Radians / 2) break;
            minutes = m;
        }
        return new Framing(width, height, diameterPixels, diameter.Radians / height.Radians, limit, fixedLimit, siderealLimit, minutes);
    }

    private static Sequences Sequence(LocalSky sky, EclipseNightSky night, Camera camera, PhotoSettings settings, List<VisibleSpan> visible)
    {
        var f = camera.EffectiveFocalLengthMm;
        var width = Optics.FieldOfView(Math.Max(camera.SensorWidthMm, camera.SensorHeightMm), f).Radians;
        var height = Optics.FieldOfView(Math.Min(camera.SensorWidthMm, camera.SensorHeightMm), f).Radians;
        var start = night.HoursFromCenter(visible[0].StartTt);
        var end = night.HoursFromCenter(visible[^1].EndTt);
        var minutes = (end - start) * 60;

        // Sample the path, project it about its middle, and take its extent with the disc.
        var middle = sky.MoonAt(0.5 * (start + end));
        var points = new List<(double X, double Y)>();
        for (var h = start; h <= end + 1e-9; h += Math.Max((end - start) / 60, 1e-3)) points.Add(Project(middle, sky.MoonAt(h)));
        var moonRadius = middle.SemiDiameter.Radians;
        var (minX, maxX, minY, maxY) = (points.Min(p => p.X), points.Max(p => p.X), points.Min(p => p.Y), points.Max(p => p.Y));
        var pathWidth = maxX - minX + 2 * moonRadius;
        var pathHeight = maxY - minY + 2 * moonRadius;
        var (aimAzimuth, aimAltitude) = Unproject(middle, 0.5 * (minX + maxX), 0.5 * (minY + maxY));

        var skyRate = AngleBetween(sky.MoonAt(start), sky.MoonAt(start + 1.0 / 60)) / 60;
        var interval = 2 * moonRadius * (1 + settings.CompositeGap) / skyRate;
        var frames = (int)Math.Floor(minutes * 60 / settings.TimeLapseIntervalSeconds) + 1;
        return new Sequences(interval, (int)Math.Floor(minutes * 60 / interval) + 1, Angle.FromRadians(pathWidth), Angle.FromRadians(pathHeight),
            pathWidth <= width && pathHeight <= height, pathWidth <= height && pathHeight <= width, aimAzimuth, aimAltitude,
            settings.TimeLapseIntervalSeconds, frames, minutes, frames / 25.0, frames * settings.FileSizeMegabytes / 1000);
    }

    // Gnomonic projection of a Moon position about a reference direction: x along the horizon (toward increasing
    // azimuth), y up. The frame is held level, its long side horizontal.
    private static (double X, double Y) Project(LocalMoon center, LocalMoon body)
    {
        var (c, p) = (Direction(center), Direction(body));
        var east = new Units.CartesianVector(-Math.Sin(center.Azimuth.Radians), Math.Cos(center.Azimuth.Radians), 0);
        var up = c.Cross(east);
        var along = p.Dot(c);
        return (p.Dot(east) / along, p.Dot(up) / along);
    }

    private static (Angle Azimuth, Angle Altitude) Unproject(LocalMoon center, double x, double y)
    {
        var c = Direction(center);
        var east = new Units.CartesianVector(-Math.Sin(center.Azimuth.Radians), Math.Cos(center.Azimuth.Radians), 0);
        var up = c.Cross(east);
        var v = (c + east * x + up * y).Normalized();
        var h = Frames.HorizontalCoordinates.FromLocalComponents(v.X, v.Y, v.Z);
        return (h.Azimuth, h.Altitude);
    }

    // Horizontal unit vector: x north, y east, z up.
    private static Units.CartesianVector Direction(LocalMoon m) => new Frames.HorizontalCoordinates(m.ApparentAltitude, m.Azimuth).LocalUnitVector();

    private static double AngleBetween(LocalMoon a, LocalMoon b)
    {
        var (u, v) = (Direction(a), Direction(b));
        return Math.Atan2(u.Cross(v).Length, u.Dot(v));
    }

    private static List<string> Cautions(LocalCircumstances local)
    {
        var cautions = new List<string>
        {
            "Never aim a lens, telescope or finder near the Sun; at a rising or setting eclipsed Moon the Sun is just below (or above) the opposite horizon — keep caps on while slewing.",
            "At night: set up in daylight if you can, keep to firm ground away from traffic, carry a red light, dress for the cold and follow local access rules.",
        };
        if (local.Contacts.Any(c => c.Visible && c.SunAltitude > SkyStates.CivilTwilightEndAltitude))
            cautions.Insert(0, "The Sun is up or only just set during part of the visible eclipse: do not look through an optical viewfinder toward the sunward sky.");
        return cautions;
    }
}
