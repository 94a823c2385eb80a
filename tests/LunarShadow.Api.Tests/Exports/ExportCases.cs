namespace LunarShadow.Api.Tests.Exports;

/// <summary>The eclipses and sites the export tests walk.</summary>
internal static class ExportCases
{
    // NASA eclipse predictions (F. Espenak), Five Millennium Canon (from memory): these dates are lunar eclipses of
    // every kind (2025-03-14 T, 2025-09-07 T, 2026-03-03 T, 2026-08-28 P, 2028-01-12 P, 2028-07-06 P, 2028-12-31 T,
    // 2029-06-26 T, 2015-04-04 T, 2023-10-28 P, 2024-03-25 N, 2020-01-10 N).
    public static readonly string[] Eclipses =
        ["2025-03-14", "2025-09-07", "2026-03-03", "2026-08-28", "2028-01-12", "2028-07-06", "2028-12-31", "2029-06-26", "2015-04-04", "2023-10-28", "2024-03-25", "2020-01-10"];

    // IANA tzdb zones: west and east of the date line (Pago Pago UTC−11, Kiritimati UTC+14), half-hour offsets
    // (Kolkata +05:30, Adelaide +09:30/+10:30 with southern DST), and DST in both hemispheres.
    public static readonly (string Name, double Lat, double Lon, string Zone)[] Sites =
    [
        ("Kiritimati", 1.87, -157.4, "Pacific/Kiritimati"),
        ("Pago Pago", -14.28, -170.7, "Pacific/Pago_Pago"),
        ("Tokyo", 35.68, 139.77, "Asia/Tokyo"),
        ("Kolkata", 22.57, 88.36, "Asia/Kolkata"),
        ("Adelaide", -34.93, 138.6, "Australia/Adelaide"),
        ("Sydney", -33.87, 151.21, "Australia/Sydney"),
        ("Berlin", 52.52, 13.4, "Europe/Berlin"),
        ("New York", 40.71, -74.0, "America/New_York"),
        ("Santiago", -33.45, -70.67, "America/Santiago"),
    ];

    public static IEnumerable<(string Date, (string Name, double Lat, double Lon, string Zone) Site)> All() =>
        from d in Eclipses from s in Sites select (d, s);

    public static string Query((string Name, double Lat, double Lon, string Zone) s) =>
        FormattableString.Invariant($"lat={s.Lat}&lon={s.Lon}&tz={Uri.EscapeDataString(s.Zone)}&name={Uri.EscapeDataString(s.Name)}");
}
