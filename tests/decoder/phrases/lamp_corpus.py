"""A five-segment corpus of invented desk-lamp instructions, with the counts derived from it by hand.

Segments (source / target / links source-target):
  S1 enciende la lámpara    / switch on the lamp   / 0-0 0-1 1-2 2-3
  S2 apaga la lámpara ya    / switch off the lamp  / 0-0 0-1 1-2 2-3      ("ya" unaligned)
  S3 la luz                 / the light .          / 0-0 1-1              ("." unaligned)
  S4 la luz roja            / a red light          / 0-0 1-2 2-1
  S5 pulsa el botón         / press button         / 0-0 2-1              ("el" unaligned)

Joint link counts c(f, e), unaligned words counted with NULL:
  enciende-switch 1, enciende-on 1, apaga-switch 1, apaga-off 1, la-the 3, la-a 1, lámpara-lamp 2,
  luz-light 2, roja-red 1, pulsa-press 1, botón-button 1, ya-NULL 1, el-NULL 1, NULL-"." 1.
Totals per source word: enciende 2, apaga 2, la 4, lámpara 2, luz 2, roja 1, pulsa 1, botón 1, ya 1,
el 1, NULL 1.
Totals per target word: switch 2, on 1, off 1, the 3, a 1, lamp 2, light 2, red 1, press 1, button 1, "." 1,
NULL 2.
"""

SEGMENTS = [
    ("enciende la lámpara", "switch on the lamp", [(0, 0), (0, 1), (1, 2), (2, 3)]),
    ("apaga la lámpara ya", "switch off the lamp", [(0, 0), (0, 1), (1, 2), (2, 3)]),
    ("la luz", "the light .", [(0, 0), (1, 1)]),
    ("la luz roja", "a red light", [(0, 0), (1, 2), (2, 1)]),
    ("pulsa el botón", "press button", [(0, 0), (2, 1)]),
]
