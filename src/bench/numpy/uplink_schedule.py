#!/usr/bin/env python3
"""The comparison script for docs/performance.md: the uplink schedule a practitioner writes first with numpy.

A station at rest at the origin sends one message a second for 1e6 s (send clock = send time) to a craft
that starts at rest at the origin and burns at 1 g0 for ever. In the null coordinate U = c t - x the craft
sits at U = (c^2/a)(1 - exp(-eta)) (Rindler hyperbolic motion), so the message sent at t_s arrives where
1 - exp(-eta) = a t_s / c: eta = -log1p(-a t_s / c), before the horizon at t_s = c / a. The columns are
those of nullpath's <link>.csv for this link, written with np.savetxt at %.17g (round-trip precision).

usage: uplink_schedule.py OUT.csv [N]
"""
import sys

import numpy as np

C = 299_792_458.0        # m/s, SI definition
A = 9.80665              # m/s^2, standard gravity (3rd CGPM, 1901)


def main():
    out = sys.argv[1]
    n = int(sys.argv[2]) if len(sys.argv) > 2 else 1_000_000
    ts = np.arange(n, dtype=np.float64)           # send clock = send time, s
    x = A * ts / C
    eta = -np.log1p(-x)                           # rapidity at arrival (all before the horizon here)
    t_rx = (C / A) * np.sinh(eta)                 # mission time of arrival
    tau_rx = (C / A) * eta                        # craft clock at arrival
    light = t_rx - ts                             # light time
    doppler = np.exp(-eta)                        # f_rx / f_tx for a receiver fleeing at rapidity eta
    offset = np.expm1(-eta)                       # doppler - 1 without cancellation
    interval = np.empty(n)
    interval[0] = np.nan
    interval[1:] = np.diff(tau_rx)                # receiver-clock time between arrivals
    beta = np.tanh(eta)
    with np.errstate(divide="ignore", invalid="ignore"):
        kappa = np.maximum(1.0, ts * (beta / (1 - beta)) / light)   # light-time condition number
    kappa[0] = 1.0
    msg = np.arange(1, n + 1, dtype=np.float64)
    table = np.column_stack([msg, ts, ts, t_rx, tau_rx, light, doppler, offset, interval, kappa])
    header = ("message,send_clock_s,send_time_s,status,receive_time_s,receive_clock_s,light_time_s,doppler,"
              "frequency_offset,receive_interval_s,light_time_condition")
    fmt = ["%d", "%.17g", "%.17g,delivered", "%.17g", "%.17g", "%.17g", "%.17g", "%.17g", "%.17g", "%.17g"]
    np.savetxt(out, table, fmt=fmt, delimiter=",", header=header, comments="")


if __name__ == "__main__":
    main()
