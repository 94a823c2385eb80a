#!/usr/bin/env bash
# A tour of every LunarShadow endpoint and format, for an invented scenario: the Hollowmere Hill Public Observatory
# (a hill-top site with a ridge to the west), the Saltmarsh Bay Planetarium network, and Mira Okafor, a photographer
# with a lakeside field site. Run the service first (dotnet run --project src/LunarShadow.Api), then:
#   bash demo-requests/try-everything.sh [http://localhost:5080]
set -euo pipefail
HOST="${1:-http://localhost:5080}"
HILL="lat=47.31&lon=11.42&elevation=1120&tz=Europe/Vienna&horizon=240:4,270:9,300:6"
LAKE="lat=46.52&lon=7.96&elevation=560&tz=Europe/Zurich"
show() { printf '\n== %s\n' "$1"; curl -sS --fail-with-body "$2" "${@:3}" | head -c 600; echo; }

show "Sun and Moon now-ish, geocentric and from the hill" "$HOST/api/v1/ephemeris?utc=2025-03-14T06:58:00Z&$HILL"
show "Eclipses 2025-2030 (JSON)" "$HOST/api/v1/eclipses?from=2025-01-01&to=2030-12-31"
show "Total eclipses to 2035 (CSV)" "$HOST/api/v1/eclipses?from=2025-01-01&to=2035-12-31&kind=total&format=csv"
show "One eclipse, opaque-layer shadow (JSON)" "$HOST/api/v1/eclipses/2025-03-14?shadow=layer&layerKm=87"
show "One eclipse (CSV via Accept)" "$HOST/api/v1/eclipses/2025-03-14" -H "Accept: text/csv"
show "Visibility map (GeoJSON)" "$HOST/api/v1/eclipses/2025-03-14/visibility-map"
show "What the hill sees, with opening hours (JSON)" "$HOST/api/v1/eclipses/2025-03-14/local?$HILL&name=Hollowmere%20Hill&open=19:00-23:30&track=15"
show "What the hill sees (CSV)" "$HOST/api/v1/eclipses/2025-03-14/local?$HILL&format=csv"
show "What the hill sees (iCalendar)" "$HOST/api/v1/eclipses/2025-03-14/local?$HILL&format=ics"
show "The planetarium network (POST, JSON)" "$HOST/api/v1/eclipses/2025-03-14/local" -H "Content-Type: application/json" \
  -d '{"sites":[{"name":"Saltmarsh Bay Planetarium","lat":-36.84,"lon":174.76,"tz":"Pacific/Auckland","open":"19:00-23:00"},{"name":"Larkspur Ridge","lat":-39.30,"lon":175.56,"elevation":1100,"tz":"Pacific/Auckland"}]}'
show "The planetarium network (POST, CSV)" "$HOST/api/v1/eclipses/2025-03-14/local?format=csv" -H "Content-Type: application/json" \
  -d '{"sites":[{"lat":-36.84,"lon":174.76},{"lat":-41.29,"lon":174.78}]}'
show "Upcoming totalities the hill can show at night (JSON)" "$HOST/api/v1/sites/upcoming?$HILL&phase=total&night=true&count=5&from=2025-01-01"
show "Upcoming, as a subscription feed (iCalendar)" "$HOST/api/v1/sites/upcoming?$HILL&phase=partial&format=ics&from=2025-01-01"
show "Upcoming (CSV)" "$HOST/api/v1/sites/upcoming?$HILL&format=csv&from=2025-01-01&count=5"
show "Mira's photo plan (JSON)" "$HOST/api/v1/eclipses/2025-03-14/photo-plan?$LAKE&iso=800&aperture=6.3&focalLength=600&mount=sidereal&danjonL=2.5"
show "Mira's photo plan (CSV timeline)" "$HOST/api/v1/eclipses/2025-03-14/photo-plan?$LAKE&format=csv"
show "Mira's photo plan (iCalendar shooting windows)" "$HOST/api/v1/eclipses/2025-03-14/photo-plan?$LAKE&format=ics"
show "Mira's exposure sequence for a camera script" "$HOST/api/v1/eclipses/2025-03-14/photo-plan?$LAKE&format=sequence&bracket=1"
show "Camera profile in the body (POST)" "$HOST/api/v1/eclipses/2025-03-14/photo-plan" -H "Content-Type: application/json" \
  -d '{"lat":47.31,"lon":11.42,"tz":"Europe/Vienna","sensor":"23.5x15.6","pixels":6000,"focalLength":14,"aperture":4,"iso":1600}'
show "Health" "$HOST/health/ready"
printf '\n== A refusal (400, problem details naming the field)\n'; curl -sS "$HOST/api/v1/eclipses/2025-03-14/local?lat=123&lon=0"; echo
