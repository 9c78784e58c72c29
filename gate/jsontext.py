"""Indented JSON, byte for byte what ``json.dumps(value, indent=2, sort_keys=True)`` writes.

report.json, reasons.json and provenance.json are written in that layout, a document at a
time. With ``indent`` set, the standard library encodes in pure Python through nested
generators; on a tiny document that was the largest single cost of writing its report
entry and its record. :func:`dumps` walks the same value with one recursive function and
the library's own C string quoting, and hands anything it is not sure to write exactly
the same way (keys that are not strings, subclasses, other types, nesting too deep) to
``json.dumps`` itself. ``tests/test_jsontext.py`` compares the two.
"""

from __future__ import annotations

import json
from collections.abc import Callable
from json.encoder import encode_basestring, encode_basestring_ascii
from typing import Any

_INFINITY = float("inf")
_float_repr = float.__repr__
_int_repr = int.__repr__


class _Other(Exception):
    """A value this module leaves to ``json.dumps``."""


def dumps(value: Any, *, ensure_ascii: bool = False, indent: int = 0) -> str:
    """``json.dumps(value, indent=2, sort_keys=True, ensure_ascii=ensure_ascii)``, every
    line after the first further indented by ``indent`` spaces (a value nested in a
    document written piece by piece)."""
    parts: list[str] = []
    quote = encode_basestring_ascii if ensure_ascii else encode_basestring
    try:
        _encode(value, "\n" + " " * indent, parts.append, quote)
    except (_Other, RecursionError, TypeError):
        text = json.dumps(value, indent=2, sort_keys=True, ensure_ascii=ensure_ascii)
        return text.replace("\n", "\n" + " " * indent) if indent else text
    return "".join(parts)


def _float(value: float) -> str:
    if value != value:
        return "NaN"
    if value == _INFINITY:
        return "Infinity"
    if value == -_INFINITY:
        return "-Infinity"
    return _float_repr(value)


def _encode(value: Any, newline: str, put: Callable[[str], Any],
            quote: Callable[[str], str]) -> None:
    kind = type(value)
    if kind is str:
        put(quote(value))
    elif value is None:
        put("null")
    elif value is True:
        put("true")
    elif value is False:
        put("false")
    elif kind is int:
        put(_int_repr(value))
    elif kind is float:
        put(_float(value))
    elif kind is dict:
        if not value:
            put("{}")
            return
        inner = newline + "  "
        separator = "{" + inner
        for key in sorted(value):  # str keys only (checked): the order of sorted(items)
            if type(key) is not str:
                raise _Other
            put(separator)
            put(quote(key))
            put(": ")
            _encode(value[key], inner, put, quote)
            separator = "," + inner
        put(newline + "}")
    elif kind is list or kind is tuple:
        if not value:
            put("[]")
            return
        inner = newline + "  "
        separator = "[" + inner
        for item in value:
            put(separator)
            _encode(item, inner, put, quote)
            separator = "," + inner
        put(newline + "]")
    else:
        raise _Other
