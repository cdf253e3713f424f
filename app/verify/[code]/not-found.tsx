import Link from "next/link";

export default function CertificateNotFound() {
  return (
    <div className="max-w-prose" data-testid="certificate-not-found">
      <h1 className="text-3xl">No certificate matches this code</h1>
      <p className="mt-3">
        Riser has no certificate with this verification code or serial. Compare it with the certificate: the verification code is
        printed under the verification address, and the serial (RSR-2026-000123) in the details panel. Codes in groups of four
        ignore capital and small letters; older codes of 24 characters are checked exactly as printed.
      </p>
      <p className="mt-3">
        A certificate that does not check out here should not be accepted as a Riser certificate. Ask its holder for a fresh copy.
      </p>
      <p className="mt-3">
        <Link href="/verify">Type a code to check</Link>
      </p>
    </div>
  );
}
