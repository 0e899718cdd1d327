"""Package data: the demo design case (the gearhead of a benchtop pump).

Read it with :func:`fitcheck.case.demo_text` / :func:`fitcheck.case.demo_case`.
"""
