"""Test helpers: generated PDFs (invented fixture content) and small policy builders."""

from __future__ import annotations

import io
import zlib
from datetime import UTC, datetime

from fpdf import FPDF
from fpdf.enums import EncryptionMethod

from gate.policy import parse_policy

FIXED = datetime(2026, 1, 1, tzinfo=UTC)


def make_pdf(pages: list[str], *, title: str | None = None, creation: str | None = None,
             user_password: str | None = None, owner_password: str | None = None) -> bytes:
    """A small PDF with one text block per page (fpdf2), byte-stable for fixed input."""
    pdf = FPDF()
    pdf.set_creation_date(FIXED)
    pdf.set_font("helvetica", size=11)
    if title:
        pdf.set_title(title)
    for text in pages:
        pdf.add_page()
        pdf.multi_cell(0, 6, text)
    if user_password or owner_password:
        pdf.set_encryption(owner_password=owner_password or "owner",
                           user_password=user_password or "",
                           encryption_method=EncryptionMethod.AES_128)
    data = bytes(pdf.output())
    if creation:
        stamp = FIXED.strftime("D:%Y%m%d%H%M%SZ")
        # fpdf2 writes its own CreationDate; swap in the one the test wants
        data = _replace_info_date(data, creation)
        del stamp
    return data


def _replace_info_date(data: bytes, creation: str) -> bytes:
    import re
    return re.sub(rb"/CreationDate \(([^)]*)\)", b"/CreationDate (" + creation.encode() + b")",
                  data, count=1)


def flate_bomb_pdf(size: int) -> bytes:
    """A one-page PDF whose content stream inflates to ``size`` bytes of spaces."""
    packed = zlib.compress(b" " * size, 9)
    objects = [
        b"<< /Type /Catalog /Pages 2 0 R >>",
        b"<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
        b"<< /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] /Contents 4 0 R >>",
        b"<< /Length %d /Filter /FlateDecode >>\nstream\n" % len(packed) + packed +
        b"\nendstream",
    ]
    out = io.BytesIO()
    out.write(b"%PDF-1.4\n")
    offsets = []
    for number, body in enumerate(objects, 1):
        offsets.append(out.tell())
        out.write(b"%d 0 obj\n" % number + body + b"\nendobj\n")
    xref = out.tell()
    out.write(b"xref\n0 %d\n0000000000 65535 f \n" % (len(objects) + 1))
    for offset in offsets:
        out.write(b"%010d 00000 n \n" % offset)
    out.write(b"trailer\n<< /Size %d /Root 1 0 R >>\nstartxref\n%d\n%%%%EOF\n" %
              (len(objects) + 1, xref))
    return out.getvalue()


def policy(text: str = ""):
    """A policy with only the given sections (YAML text) switched on."""
    return parse_policy("version: 1\nname: test-policy\n" + text, "test-policy.yaml")
