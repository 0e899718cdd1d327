"""Time one housing-screw joint with every check (goal: under 5 ms per joint)."""

import time
import warnings

from fitcheck.screws import ScrewJointInput, evaluate

CASE = {
    "name": "gearhead cover", "thread": "M5", "property_class": "10.9", "head": "socket", "washer": True,
    "layers": [{"thickness": "6 mm", "material": "EN AW-6082-T6"}], "engagement": "10 mm",
    "housing_material": "EN AC-46000", "count": 6, "bolt_circle": "72 mm", "axial_force": "1.8 kN",
    "tilting_moment": "25 N*m", "transverse_force": "600 N", "torque_about_axis": "8 N*m",
    "mu_thread": [0.10, 0.16], "tightening": "torque_wrench_estimated_friction",
    "temperature_min": "-20 degC", "temperature_max": "90 degC",
}


def main() -> None:
    warnings.simplefilter("ignore")
    inp = ScrewJointInput.from_mapping(CASE)
    evaluate(inp)  # warm the table caches
    n = 300
    t0 = time.perf_counter()
    for _ in range(n):
        r = evaluate(inp)
    t_eval = (time.perf_counter() - t0) / n
    t0 = time.perf_counter()
    for _ in range(n):
        ScrewJointInput.from_mapping(CASE)
    t_parse = (time.perf_counter() - t0) / n
    print(f"screws: evaluate one joint with {len(r.checks)} checks: {t_eval * 1e3:.2f} ms "
          f"(goal < 5 ms); parse its table: {t_parse * 1e3:.2f} ms; ok = {r.ok}")


if __name__ == "__main__":
    main()
