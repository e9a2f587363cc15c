"""Outside reference for the test suite: angles, separations and sky frames with Debian's astropy.

Reads JSON from stdin:
  {"parse": [[text, "hourangle" | "deg"], ...],
   "format": [[degrees, "ra" | "dec", decimals], ...],
   "separation": [[ra1, dec1, ra2, dec2], ...],            (degrees)
   "frames": [{"from": name, "to": name, "points": [[lon, lat], ...]}, ...]}   (degrees; names below)
and writes {"parse": [deg, ...], "format": [text, ...], "separation": [deg, ...],
"frames": [[[lon, lat], ...] for each group]} in degrees.

Frame names: "icrs"; "galactic" (astropy's own: the IAU 1958 pole precessed to FK5 J2000, reached
from ICRS through the FK5 frame bias); "hipparcos_galactic" (the Hipparcos realisation, ESA 1997
Vol. 1 §1.5.3: the same pole and origin values taken in the ICRS, built here with astropy's own
rotation-matrix composition, the one its FK5 -> Galactic transform uses); "supergalactic" (astropy's,
from its Galactic); "hipparcos_supergalactic" (astropy's galactic -> supergalactic rotation applied to
the Hipparcos galactic frame); "custom_ecliptic" (CustomBarycentricEcliptic with the IAU 2006
obliquity 84381.406"); "mean_ecliptic", "true_ecliptic" (BarycentricMean/TrueEcliptic, equinox
J2000); "geocentric_mean_ecliptic", "geocentric_true_ecliptic" (obstime J2000).
"""
import json
import sys

import astropy.units as u
import numpy as np
from astropy.coordinates import (
    ICRS,
    Angle,
    BarycentricMeanEcliptic,
    BarycentricTrueEcliptic,
    BaseCoordinateFrame,
    CustomBarycentricEcliptic,
    Galactic,
    GeocentricMeanEcliptic,
    GeocentricTrueEcliptic,
    RepresentationMapping,
    SkyCoord,
    SphericalRepresentation,
    StaticMatrixTransform,
    UnitSphericalRepresentation,
    Supergalactic,
    frame_transform_graph,
)
from astropy.coordinates.matrix_utilities import rotation_matrix


class HipparcosGalactic(BaseCoordinateFrame):
    default_representation = SphericalRepresentation
    frame_specific_representation_info = {
        SphericalRepresentation: [RepresentationMapping("lon", "l"), RepresentationMapping("lat", "b")]
    }


class HipparcosSupergalactic(BaseCoordinateFrame):
    default_representation = SphericalRepresentation
    frame_specific_representation_info = {
        SphericalRepresentation: [RepresentationMapping("lon", "sgl"), RepresentationMapping("lat", "sgb")]
    }


@frame_transform_graph.transform(StaticMatrixTransform, ICRS, HipparcosGalactic)
def icrs_to_hipparcos_galactic():
    # ESA 1997 Vol. 1 §1.5.3: pole (192.85948, 27.12825), celestial pole at l = 122.93192 (all deg)
    return rotation_matrix(180 - 122.93192, "z") @ rotation_matrix(90 - 27.12825, "y") @ rotation_matrix(192.85948, "z")


@frame_transform_graph.transform(StaticMatrixTransform, HipparcosGalactic, ICRS)
def hipparcos_galactic_to_icrs():
    return icrs_to_hipparcos_galactic().T


@frame_transform_graph.transform(StaticMatrixTransform, HipparcosGalactic, HipparcosSupergalactic)
def hipparcos_galactic_to_supergalactic():
    # astropy's own Galactic -> Supergalactic rotation (its gal_to_supergal), pole from Supergalactic._nsgp_gal
    pole = Supergalactic._nsgp_gal
    return rotation_matrix(90, "z") @ rotation_matrix(90 - pole.b.degree, "y") @ rotation_matrix(pole.l.degree, "z")


@frame_transform_graph.transform(StaticMatrixTransform, HipparcosSupergalactic, HipparcosGalactic)
def hipparcos_supergalactic_to_galactic():
    return hipparcos_galactic_to_supergalactic().T


FRAMES = {
    "icrs": lambda: ICRS(),
    "galactic": lambda: Galactic(),
    "hipparcos_galactic": lambda: HipparcosGalactic(),
    "supergalactic": lambda: Supergalactic(),
    "hipparcos_supergalactic": lambda: HipparcosSupergalactic(),
    "custom_ecliptic": lambda: CustomBarycentricEcliptic(obliquity=84381.406 * u.arcsec),
    "mean_ecliptic": lambda: BarycentricMeanEcliptic(equinox="J2000"),
    "true_ecliptic": lambda: BarycentricTrueEcliptic(equinox="J2000"),
    "geocentric_mean_ecliptic": lambda: GeocentricMeanEcliptic(equinox="J2000", obstime="J2000"),
    "geocentric_true_ecliptic": lambda: GeocentricTrueEcliptic(equinox="J2000", obstime="J2000"),
}


def convert(source, target, points):
    lon, lat = np.array(points, dtype=float).reshape(-1, 2).T
    c = SkyCoord(FRAMES[source]().realize_frame(UnitSphericalRepresentation(lon=lon * u.deg, lat=lat * u.deg)))
    out = c.transform_to(FRAMES[target]()).represent_as(UnitSphericalRepresentation)
    return np.column_stack([out.lon.to_value(u.deg), out.lat.to_value(u.deg)]).tolist()


def text_of(degrees, part, decimals):
    angle = Angle(degrees * u.deg)
    if part == "ra":
        return angle.to_string(unit=u.hourangle, sep=":", precision=decimals, pad=True)
    return angle.to_string(unit=u.deg, sep=":", precision=decimals, pad=True, alwayssign=True)


def separations(pairs):
    if not pairs:
        return []
    ra1, dec1, ra2, dec2 = np.array(pairs, dtype=float).T
    return SkyCoord(ra1 * u.deg, dec1 * u.deg).separation(SkyCoord(ra2 * u.deg, dec2 * u.deg)).degree.tolist()


def main():
    request = json.load(sys.stdin)
    reply = {
        "parse": [Angle(text, unit=u.hourangle if unit == "hourangle" else u.deg).degree for text, unit in request.get("parse", [])],
        "format": [text_of(*item) for item in request.get("format", [])],
        "separation": separations(request.get("separation", [])),
        "frames": [convert(group["from"], group["to"], group["points"]) for group in request.get("frames", [])],
    }
    json.dump(reply, sys.stdout)


main()
