using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Api.Observations;

/// <summary>
/// The checks of observations against the eclipse, computed from the models under the default shadow model (danjon)
/// and ΔT model: the instant lies between P1 and P4; a timing lies within <see cref="CrossingWindowMinutes"/> of the
/// predicted crossing of its feature; the Moon's upper limb is above the site's horizon (almanac convention: apparent
/// altitude 0° with standard refraction, no dip) at that instant.
/// </summary>
internal static class ObservationChecks
{
    /// <summary>How far a timing may lie from the predicted crossing, minutes.</summary>
    public const double CrossingWindowMinutes = 30;

    private static readonly Instant EarliestStorable = Instant.FromDateTimeOffset(DateTimeOffset.MinValue);

    /// <summary>The drafts to store, in request order; null when any fails a check (problems on the reader).</summary>
    public static IReadOnlyList<ObservationDraft>? Check(LunarEclipse eclipse, TimeScaleConverter time, IReadOnlyList<ObservationInput> inputs, QueryReader reader)
    {
        var toUtc = NightClock.For(eclipse, time);
        var p1 = toUtc(eclipse.Contact(ContactName.P1)!.Tt);
        var p4 = toUtc(eclipse.Contact(ContactName.P4)!.Tt);
        var deltaTSeconds = time.DeltaTAt(eclipse.GreatestEclipse).Seconds;
        var crossings = new FeatureShadowCrossings(eclipse);
        var predicted = new Dictionary<string, FeatureTiming>(StringComparer.Ordinal);
        var drafts = new List<ObservationDraft>();
        foreach (var input in inputs)
        {
            var field = input.Prefix + ObservationParameters.Utc.Name;
            if (input.Utc < EarliestStorable)
            {
                reader.Fail(field, $"{field} must lie in the year 1 or later: observations are stored with .NET date-times; got {TimeFormats.Utc(input.Utc)}.");
                continue;
            }
            if (input.Utc < p1 || input.Utc > p4)
            {
                reader.Fail(field, $"{field} must lie within the eclipse, from P1 {TimeFormats.Utc(p1)} to P4 {TimeFormats.Utc(p4)}; got {TimeFormats.Utc(input.Utc)}.");
                continue;
            }
            if (input.Kind == ObservationKinds.CraterTiming && !NearCrossing(input, crossings, predicted, toUtc, reader)) continue;
            if (!MoonIsUp(eclipse, input, deltaTSeconds, time, reader)) continue;
            drafts.Add(new ObservationDraft(input.Kind, input.Feature, input.Crossing, input.DanjonValue, input.Utc.ToDateTimeOffset(),
                input.Site, input.UncertaintySeconds, input.Optics, input.Observer));
        }
        return reader.IsValid ? drafts : null;
    }

    private static bool NearCrossing(ObservationInput input, FeatureShadowCrossings crossings, Dictionary<string, FeatureTiming> predicted, Func<TtInstant, Instant> toUtc, QueryReader reader)
    {
        if (!predicted.TryGetValue(input.Feature!, out var timing))
            predicted[input.Feature!] = timing = crossings.Compute([LunarFeatureCatalog.Find(input.Feature!)!])[0];
        var crossing = input.Crossing == CrossingDirection.Emersion ? timing.UmbraEmersion : timing.UmbraImmersion;
        var wire = Common.WireNames.Of(input.Crossing!.Value);
        if (crossing is null)
        {
            var field = input.Prefix + ObservationParameters.Feature.Name;
            reader.Fail(field, $"{field}: the umbra does not reach {input.Feature} in this eclipse (danjon shadow model), so it has no {wire} to time.");
            return false;
        }
        var expected = toUtc(crossing.Tt);
        var offMinutes = (input.Utc - expected).TotalMinutes;
        if (Math.Abs(offMinutes) <= CrossingWindowMinutes) return true;
        var utcField = input.Prefix + ObservationParameters.Utc.Name;
        reader.Fail(utcField, FormattableString.Invariant(
            $"{utcField} must lie within {CrossingWindowMinutes} minutes of the predicted {wire} of {input.Feature}, {TimeFormats.Utc(expected)} (danjon shadow model); got {TimeFormats.Utc(input.Utc)}, {offMinutes:0.#} minutes off."));
        return false;
    }

    private static bool MoonIsUp(LunarEclipse eclipse, ObservationInput input, double deltaTSeconds, TimeScaleConverter time, QueryReader reader)
    {
        var site = Site.At(input.Site.LatitudeDegrees, input.Site.LongitudeDegrees, input.Site.ElevationMetres);
        var sky = new LocalSky(eclipse.NightSky, site, deltaTSeconds);
        var hours = eclipse.NightSky.HoursFromCenter(time.ToTerrestrialTime(input.Utc));
        var altitude = sky.MoonAt(hours).UpperLimbApparentAltitude.Degrees;
        if (altitude >= 0) return true;
        var field = input.Prefix + ObservationParameters.SiteName;
        reader.Fail(field, FormattableString.Invariant(
            $"{field}: the Moon is below the horizon there at {TimeFormats.Utc(input.Utc)} (upper limb at {altitude:0.0}° apparent altitude); an observation must come from a site that sees the Moon."));
        return false;
    }
}
