/** A phone number as written, dialled by its digits on a tap. */
export function PhoneLink({ phone, className = "underline" }: { phone: string; className?: string }) {
  return (
    <a className={className} href={`tel:${phone.replace(/[^\d+]/g, "")}`}>
      {phone}
    </a>
  );
}
