"""fitcheck — seat fits, press fits, bearing seats and housing screws for compact geared drives.

Results are engineering estimates from standard tables and published methods
(ISO 286, Lamé thick-cylinder theory as used in DIN 7190, VDI 2230). Verify by
test, and follow the applicable standards, local codes and licensed
professional practice.
"""

from .checks import Check
from .errors import FitcheckError, InputError, InputErrors
from .units import Q_, ureg

__version__ = "0.1.0"

CAUTION = (
    "Engineering estimate from standard tables and published methods: verify every result by "
    "test before release. Pressing and heating parts for assembly can cause injury (pinch points, "
    "burns, parts that let go under load): follow the shop's safe-work instructions. The "
    "applicable standards, local codes and licensed professional practice take precedence over "
    "this program."
)

__all__ = ["CAUTION", "Check", "FitcheckError", "InputError", "InputErrors", "Q_", "ureg", "__version__"]
