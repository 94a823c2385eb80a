using LunarShadow.Astronomy.Shadow;
using Xunit.Abstractions;

namespace LunarShadow.Astronomy.Tests.Eclipses;

public class CanonCheckTests(ITestOutputHelper output)
{
    // Five Millennium Canon of Lunar Eclipses, Espenak & Meeus (2009), NASA/TP-2009-214172, Danjon rule: greatest eclipse
    // in TD (= TT), gamma, penumbral and umbral magnitudes, penumbral/partial/total durations (min), Saros series.
    // Targets between 1600 and 2400: 3 s, 0.0005 in gamma, 0.001 in magnitude, 0.3 min in duration.
    [Theory]
    [InlineData(1917, 12, 28, "09:46:32", -0.4484, 2.0652, 1.0056, 343.0, 202.3, 12.0, 133)]
    [InlineData(1956, 5, 24, "15:31:52", -0.4726, 2.0174, 0.9647, 348.5, 204.5, null, 120)]
    [InlineData(1969, 8, 27, "10:48:15", -1.5407, 0.0131, -0.9516, 31.3, null, null, 108)]
    [InlineData(2000, 1, 21, "04:44:34", -0.2957, 2.3060, 1.3246, 318.2, 203.3, 77.0, 124)]
    [InlineData(2011, 6, 15, "20:13:43", 0.0897, 2.6868, 1.6999, 336.1, 219.3, 100.2, 130)]
    [InlineData(2015, 4, 4, "12:01:24", 0.4460, 2.0792, 1.0008, 357.5, 209.0, 4.7, 132)]
    [InlineData(2021, 11, 19, "09:04:06", -0.4552, 2.0720, 0.9742, 361.5, 208.4, null, 126)]
    [InlineData(2022, 11, 8, "11:00:22", 0.2570, 2.4143, 1.3589, 353.9, 219.8, 85.0, 136)]
    [InlineData(2023, 5, 5, "17:24:05", -1.0349, 0.9636, -0.0457, 257.5, null, null, 141)]
    [InlineData(2025, 3, 14, "06:59:56", 0.3484, 2.2595, 1.1784, 362.6, 218.3, 65.4, 123)]
    [InlineData(2027, 7, 18, "16:04:09", -1.5758, 0.0014, -1.0680, 11.8, null, null, 110)]
    [InlineData(2070, 4, 25, "09:21:24", 1.0044, 1.0515, -0.0209, 286.9, null, null, 142)]
    [InlineData(2100, 8, 19, "21:44:58", -1.0905, 0.8716, -0.1575, 254.2, null, null, 120)]
    public void Global_circumstances_match_the_five_millennium_canon(int year, int month, int day, string greatestTd,
        double gamma, double penumbral, double umbral, double penMinutes, double? parMinutes, double? totMinutes, int saros)
    {
        var e = EclipseOnDate.Find(year, month, day);
        var expectedSeconds = TimeSpan.Parse(greatestTd, System.Globalization.CultureInfo.InvariantCulture).TotalSeconds;
        var actualSeconds = EclipseOnDate.SecondsOfDay(e.GreatestEclipse);
        output.WriteLine($"{year}-{month:00}-{day:00}: Δt {actualSeconds - expectedSeconds:+0.0;-0.0} s, Δγ {e.Gamma - gamma:+0.00000;-0.00000}, Δpen {e.PenumbralMagnitude - penumbral:+0.0000;-0.0000}, Δumb {e.UmbralMagnitude - umbral:+0.0000;-0.0000}, pen {e.Durations.PenumbralMinutes - penMinutes:+0.00;-0.00} min, par {(e.Durations.PartialMinutes - parMinutes):+0.00;-0.00}, tot {(e.Durations.TotalMinutes - totMinutes):+0.00;-0.00}");
        Assert.Equal(expectedSeconds, actualSeconds, 3.0);
        Assert.Equal(gamma, e.Gamma, 0.0005);
        Assert.Equal(penumbral, e.PenumbralMagnitude, 0.001);
        Assert.Equal(umbral, e.UmbralMagnitude, 0.001);
        // A grazing eclipse's duration goes as √(magnitude): a magnitude within the 0.001 target moves it by
        // T·Δm/(2m), so for magnitudes under 0.1 the duration tolerance follows from the magnitude tolerance.
        Assert.Equal(penMinutes, e.Durations.PenumbralMinutes, Math.Max(0.3, penMinutes * 0.001 / (2 * penumbral)));
        Assert.Equal(parMinutes is null, e.Durations.PartialMinutes is null);
        Assert.Equal(totMinutes is null, e.Durations.TotalMinutes is null);
        if (parMinutes is not null) Assert.Equal(parMinutes.Value, e.Durations.PartialMinutes!.Value, 0.3);
        if (totMinutes is not null) Assert.Equal(totMinutes.Value, e.Durations.TotalMinutes!.Value, 0.3);
        Assert.Equal(saros, e.Saros.Series);
    }

    // Five Millennium Canon (as above), the two oldest rows. The canon's lunar theory (ELP-2000/82 with its own secular
    // terms) and ours (ELP/MPP02, DE405) drift apart far from the present, so these are measured and reported
    // (docs/accuracy.md) with looser bounds: greatest eclipse within 5 min of TD, gamma within 0.01, magnitudes within 0.02.
    [Theory]
    [InlineData(-1999, 6, 26, "14:13:28", -1.0981, 0.8791, -0.1922, 268.8, 17)]
    [InlineData(-1997, 5, 6, "18:57:01", 0.1003, 2.6513, 1.6963, 322.8, -1)]
    public void Ancient_eclipses_stay_close_to_the_canon(int year, int month, int day, string greatestTd,
        double gamma, double penumbral, double umbral, double penMinutes, int saros)
    {
        var e = EclipseOnDate.Find(year, month, day);
        var expectedSeconds = TimeSpan.Parse(greatestTd, System.Globalization.CultureInfo.InvariantCulture).TotalSeconds;
        var actualSeconds = EclipseOnDate.SecondsOfDay(e.GreatestEclipse);
        output.WriteLine($"{year}-{month:00}-{day:00}: Δt {actualSeconds - expectedSeconds:+0.0;-0.0} s, Δγ {e.Gamma - gamma:+0.00000;-0.00000}, Δpen {e.PenumbralMagnitude - penumbral:+0.0000;-0.0000}, Δumb {e.UmbralMagnitude - umbral:+0.0000;-0.0000}, pen {e.Durations.PenumbralMinutes - penMinutes:+0.00;-0.00} min");
        Assert.Equal(expectedSeconds, actualSeconds, 300.0);
        Assert.Equal(gamma, e.Gamma, 0.01);
        Assert.Equal(penumbral, e.PenumbralMagnitude, 0.02);
        Assert.Equal(umbral, e.UmbralMagnitude, 0.02);
        Assert.Equal(saros, e.Saros.Series);
    }

    // NASA lunar eclipse predictions (F. Espenak), Danjon rule, contacts in UT with the canon's ΔT (2022: 73 s;
    // 2015: 69 s), here compared in TT = UT + that ΔT. Target: 10 s.
    [Theory]
    [InlineData(2022, 11, 8, 73, new[] { "08:02:17", "09:09:12", "10:16:39", "11:41:37", "12:49:03", "13:56:08" })]
    [InlineData(2015, 4, 4, 69, new[] { "09:01:27", "10:15:45", "11:57:54", "12:02:37", "13:44:46", "14:58:58" })]
    public void Contacts_match_the_published_predictions(int year, int month, int day, double deltaT, string[] contactsUt)
    {
        var e = EclipseOnDate.Find(year, month, day);
        Assert.Equal(6, e.Contacts.Count);
        for (var i = 0; i < 6; i++)
        {
            var expected = TimeSpan.Parse(contactsUt[i], System.Globalization.CultureInfo.InvariantCulture).TotalSeconds + deltaT;
            var actual = EclipseOnDate.SecondsOfDay(e.Contacts[i].Tt);
            output.WriteLine($"{e.Contacts[i].Name}: {actual - expected:+0.0;-0.0} s");
            Assert.Equal(expected, actual, 10.0);
        }
    }

    // NASA's earlier catalogue (F. Espenak), Chauvenet rule: 2022 Nov 08 umbral 1.363, penumbral 2.440; 2015 Apr 04
    // umbral 1.005, penumbral 2.105 (three decimals, so 0.0015 covers rounding plus our 0.001 target).
    [Theory]
    [InlineData(2022, 11, 8, 1.363, 2.440)]
    [InlineData(2015, 4, 4, 1.005, 2.105)]
    public void Chauvenet_magnitudes_match_the_earlier_catalogue(int year, int month, int day, double umbral, double penumbral)
    {
        var e = EclipseOnDate.Find(year, month, day, ShadowModel.Chauvenet);
        Assert.Equal(umbral, e.UmbralMagnitude, 0.0015);
        Assert.Equal(penumbral, e.PenumbralMagnitude, 0.0015);
        Assert.Equal("chauvenet", e.Model.Name);
    }
}
