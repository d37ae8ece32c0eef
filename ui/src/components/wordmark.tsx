/**
 * The Fuelwright wordmark: a fuel drop with a level line (the float-bowl level the product cares
 * about) beside the name. Colours come from the stylesheet so both themes read well.
 */
export function Wordmark({ size = 28, showName = true }: { size?: number; showName?: boolean }) {
  return (
    <span className="fw-wordmark" aria-label="Fuelwright">
      <svg
        className="fw-wordmark-mark"
        width={size}
        height={size}
        viewBox="0 0 32 32"
        aria-hidden="true"
        focusable="false"
      >
        <path className="fw-wordmark-drop" d="M16 2.5c-4.6 6.4-10 12.3-10 18a10 10 0 0 0 20 0c0-5.7-5.4-11.6-10-18z" />
        <path className="fw-wordmark-level" d="M8.2 19.5h15.6" strokeWidth="2.6" strokeLinecap="round" />
      </svg>
      {showName && (
        <span className="fw-wordmark-name" aria-hidden="true">
          Fuel<span className="fw-wordmark-accent">wright</span>
        </span>
      )}
    </span>
  );
}
