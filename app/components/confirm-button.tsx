import {
  useId,
  useRef,
  type ButtonHTMLAttributes,
  type ReactNode,
} from "react";

/** What the question asks and what saying yes does, in the words of the page. */
export interface ConfirmQuestion {
  /** The question, naming the thing: "Cancel BO-12?" */
  title: string;
  /** Exactly what will happen: "Whatever it holds is released …" */
  consequence: ReactNode;
  /** The button that goes ahead: "Cancel BO-12". */
  confirmLabel: string;
  /** The button that changes nothing. */
  keepLabel?: string;
}

type ConfirmButtonProps = Omit<
  ButtonHTMLAttributes<HTMLButtonElement>,
  "type" | "onClick"
> & {
  question: ConfirmQuestion;
};

/**
 * A submit button for something that cannot be taken back (cancel, revoke,
 * remove, close short, deactivate, archive): pressed, it asks once in a modal
 * <dialog> that names what will happen; only "yes" sends its form, with this
 * button as the submitter (so its name and value go along). Escape or the
 * other button closes the dialog and the focus returns to this button.
 *
 * Progressive enhancement: until the page's JavaScript runs (or without it)
 * the button submits its form directly, as a plain submit button. The server
 * checks the role and the state either way; the dialog is only a question.
 */
export function ConfirmButton({
  question,
  children,
  ...button
}: ConfirmButtonProps) {
  const buttonRef = useRef<HTMLButtonElement>(null);
  const dialogRef = useRef<HTMLDialogElement>(null);
  const keepRef = useRef<HTMLButtonElement>(null);
  const id = useId();

  const ask = (event: React.MouseEvent<HTMLButtonElement>) => {
    event.preventDefault();
    dialogRef.current?.showModal();
    // The safe choice has the focus: Enter pressed twice by habit changes nothing.
    keepRef.current?.focus();
  };
  const keep = () => dialogRef.current?.close();
  const goAhead = () => {
    const submitter = buttonRef.current;
    dialogRef.current?.close();
    submitter?.form?.requestSubmit(submitter);
  };

  return (
    <>
      <button ref={buttonRef} type="submit" onClick={ask} {...button}>
        {children}
      </button>
      <dialog
        ref={dialogRef}
        aria-labelledby={`${id}-title`}
        aria-describedby={`${id}-consequence`}
        // Escape closes it natively; either way the focus goes back to the button.
        onClose={() => buttonRef.current?.focus()}
        className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-lg border border-rule bg-sheet p-0 text-graphite-900 shadow-lg backdrop:bg-graphite-900/50"
      >
        <div className="space-y-4 p-5">
          <h2 id={`${id}-title`} className="text-lg font-semibold">
            {question.title}
          </h2>
          <div id={`${id}-consequence`} className="text-sm text-graphite-700">
            {question.consequence}
          </div>
          <div className="flex flex-wrap justify-end gap-3">
            <button
              ref={keepRef}
              type="button"
              className="button-quiet"
              onClick={keep}
            >
              {question.keepLabel ?? "Go back"}
            </button>
            <button
              type="button"
              className="inline-flex items-center justify-center rounded-md bg-danger px-4 py-2 text-sm font-medium text-white shadow-xs hover:bg-danger/90"
              onClick={goAhead}
            >
              {question.confirmLabel}
            </button>
          </div>
        </div>
      </dialog>
    </>
  );
}
