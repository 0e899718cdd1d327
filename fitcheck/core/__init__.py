"""Pure numeric kernels: plain floats and NumPy arrays in core units (mm, N, MPa, N·mm, K).

No pint, no Streamlit, no I/O. Every kernel broadcasts over its arguments and
cites the equation it implements.
"""
