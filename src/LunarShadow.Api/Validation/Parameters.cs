using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Validation;

/// <summary>
/// The parameters shared by several endpoints, each described once. Feature-only parameters live beside their feature
/// (EclipseParameters, UpcomingParameters, PhotoParameters); every endpoint lists the ones it takes in its
/// <see cref="EndpointParameters"/>.
/// </summary>
internal static class Parameters
{
    private const string CalendarNote = "Julian calendar before 1582-10-15, astronomical year numbering (e.g. -0584-05-28)";

    /// <summary>The eclipse's id in the route.</summary>
    public static readonly Parameter EclipseDate = new("date", ParameterType.Date,
        $"UTC date of greatest eclipse, YYYY-MM-DD ({CalendarNote}), years {SupportedRange.FirstYear} to +{SupportedRange.LastYear}.")
    {
        Required = true, Place = ParameterPlace.Path,
    };

    // The site, in the same words for every per-site endpoint and every JSON body.
    public static readonly Parameter Latitude = new("lat", ParameterType.Number, "Geodetic latitude, north positive (WGS84).")
    {
        Unit = "degrees", Minimum = -90, Maximum = 90, Required = true,
    };

    public static readonly Parameter Longitude = new("lon", ParameterType.Number, "Longitude, east positive (WGS84).")
    {
        Unit = "degrees", Minimum = -180, Maximum = 180, Required = true,
    };

    public static readonly Parameter Elevation = new("elevation", ParameterType.Number, "Height above the WGS84 ellipsoid.")
    {
        Unit = "metres", Minimum = -500, Maximum = 9000, Default = 0.0,
    };

    public static readonly Parameter TimeZone = new("tz", ParameterType.Text,
        "IANA time zone of the site, e.g. Europe/Vienna (tzdb as carried by NodaTime).")
    {
        Default = "UTC", MaxLength = 64,
    };

    public static readonly Parameter MinAltitude = new("minAltitude", ParameterType.Number,
        "Lowest useful altitude of the Moon's upper limb; only the part with the Moon at least this high counts as visible.")
    {
        Unit = "degrees", Minimum = -5, Maximum = 60, Default = 0.0,
    };

    /// <summary>Most horizon-profile points.</summary>
    public const int MaxHorizonPoints = 360;

    public static readonly Parameter Horizon = new("horizon", ParameterType.Text,
        $"Local horizon profile: azimuth:altitude pairs in degrees, comma-separated, e.g. 90:5,180:12,270:3 (azimuth 0–360 from north through east, altitude −5 to 90; up to {MaxHorizonPoints} points; linear between them). In a JSON body also an array of [azimuth, altitude] pairs. Or sea: a flat sea horizon lowered by the dip for the site's elevation; without it rise and set follow the almanac convention (upper limb at 0° with refraction, no dip).")
    {
        Pattern = @"^\s*(sea|-?[0-9.]+\s*:\s*-?[0-9.]+\s*(,\s*-?[0-9.]+\s*:\s*-?[0-9.]+\s*)*)\s*$",
    };

    public static readonly Parameter Pressure = new("pressure", ParameterType.Number, "Air pressure at the site, for refraction.")
    {
        Unit = "hPa", Minimum = 0, Maximum = 1200, Default = AirConditions.Standard.PressureHectopascals,
    };

    public static readonly Parameter Temperature = new("temperature", ParameterType.Number, "Air temperature at the site, for refraction.")
    {
        Unit = "°C", Minimum = -90, Maximum = 60, Default = AirConditions.Standard.TemperatureCelsius,
    };

    public static readonly Parameter SiteName = new("name", ParameterType.Text, "A free-text name for the site, echoed back.")
    {
        MaxLength = 200,
    };

    public static readonly Parameter Open = new("open", ParameterType.Text,
        "Opening hours in the site's local time, HH:MM-HH:MM (e.g. 19:00-23:30; may span midnight, e.g. 21:00-02:00): adds a public-night plan, and only the part inside counts.")
    {
        Pattern = "^[0-9]{2}:[0-9]{2}-[0-9]{2}:[0-9]{2}$",
    };

    /// <summary>Every field of one site, as every per-site GET and every JSON site object takes them.</summary>
    public static readonly IReadOnlyList<Parameter> Site =
        [Latitude, Longitude, Elevation, TimeZone, MinAltitude, Horizon, Pressure, Temperature, SiteName, Open];

    // The computation choices every eclipse endpoint shares.
    public static readonly Parameter Shadow = new("shadow", ParameterType.Choice,
        "Shadow enlargement model: danjon (1.01·π☾ + π☉ ± s☉), chauvenet (1.02 × (0.998340·π☾ + π☉ ± s☉)), none (geometric cones), or layer (an opaque atmosphere of height layerKm above the WGS84 ellipsoid: elliptical shadow).")
    {
        Allowed = ShadowModel.Names, Default = "danjon",
    };

    /// <summary>The shadow choice that uses the crater timings stored for the eclipse.</summary>
    public const string MeasuredShadow = "measured";

    /// <summary>The shadow choice of the endpoints that can use the observers' log (local, photo-plan, craters).</summary>
    public static readonly Parameter MeasurableShadow = Shadow with
    {
        Allowed = [.. ShadowModel.Names, MeasuredShadow],
        Description = Shadow.Description + $" Or measured: the geometric umbra enlarged by the percentage fitted to this eclipse's stored crater timings (at least {LunarShadow.Astronomy.Eclipses.UmbralEnlargementFit.MinimumTimings}; fewer give a 409 problem); the response says how many timings were used and the fitted value.",
    };

    public static readonly Parameter LayerKm = new("layerKm", ParameterType.Number,
        "Opaque-layer height for shadow=layer (default after Herald & Sinnott 2014).")
    {
        Unit = "km", Minimum = 0, Maximum = 500, Default = ShadowModel.DefaultLayerHeightKm,
    };

    /// <summary>Fixed ΔT limits, seconds: wide enough for the ancient end of the span (about 46,000 s at −1999).</summary>
    public static readonly Parameter DeltaT = new("deltaT", ParameterType.Number,
        "Fixed ΔT = TT − UT1; overrides the model. Omit to use deltaTModel.")
    {
        Unit = "seconds", Minimum = -1000, Maximum = 100_000,
    };

    public static readonly Parameter DeltaTModel = new("deltaTModel", ParameterType.Choice,
        "ΔT model: best (measured values, Stephenson–Morrison–Hohenkerk 2016/2021 outside them) or espenak-meeus-2006 (the Five Millennium Canon's polynomials).")
    {
        Allowed = DeltaTModelCatalog.Names, Default = DeltaTModelCatalog.Names[0],
    };

    /// <summary>The computation choices of every eclipse endpoint.</summary>
    public static readonly IReadOnlyList<Parameter> Model = [Shadow, LayerKm, DeltaT, DeltaTModel];

    /// <summary>The computation choices of the endpoints that also take shadow=measured.</summary>
    public static readonly IReadOnlyList<Parameter> MeasurableModel = [MeasurableShadow, LayerKm, DeltaT, DeltaTModel];

    /// <summary>The response format among those an endpoint offers (the first is the default).</summary>
    public static Parameter Format(IReadOnlyList<string> names) => new("format", ParameterType.Choice,
        "Response format; overrides the Accept header.")
    {
        Allowed = names, Default = names[0],
    };
}
