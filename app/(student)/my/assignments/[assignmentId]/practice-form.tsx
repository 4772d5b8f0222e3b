"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/field";
import { logPracticeAction } from "../../actions";
import { COMMENT_MAX, PracticeEntryInput } from "../../practice-input";

const inputClass = "rounded-xl border border-line bg-card px-3 py-2 text-base focus:border-walnut outline-none aria-[invalid=true]:border-madder";
const numberOrUndefined = (v: unknown) => (v === "" || v == null ? undefined : Number(v));

function Error({ id, messages }: { id: string; messages?: string | string[] }) {
  const text = Array.isArray(messages) ? messages.join(" ") : messages;
  return text ? <p id={id} role="alert" className="text-sm text-madder">{text}</p> : null;
}

/** The practice entry form: date, minutes, tempo reached per drill, ease 1–5, comment. */
export function PracticeForm({ assignmentId, drills, today }: { assignmentId: string; drills: { id: string; title: string }[]; today: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [serverErrors, setServerErrors] = useState<Record<string, string[]>>({});
  const [saved, setSaved] = useState(false);
  const [round, setRound] = useState(0);
  // Every drill's tempo field named in the defaults, so a reset after saving empties each box.
  const blank = (): PracticeEntryInput => ({
    assignmentId,
    practisedOn: today,
    minutes: 15,
    ease: 3,
    comment: "",
    tempos: Object.fromEntries(drills.map((d) => [d.id, undefined])),
  });
  const form = useForm<PracticeEntryInput>({ resolver: zodResolver(PracticeEntryInput), defaultValues: blank() });
  const { errors, isSubmitting } = form.formState;
  // radios keep a number in the form state (register's setValueAs applies to text inputs only)
  const ease = form.watch("ease");
  const err = (field: "practisedOn" | "minutes" | "ease" | "comment"): string | string[] | undefined =>
    (errors[field]?.message as string | undefined) ?? serverErrors[field];

  async function onSubmit(values: PracticeEntryInput) {
    setMessage(null);
    setSaved(false);
    const result = await logPracticeAction(values);
    if (!result.ok) {
      setMessage(result.message);
      setServerErrors(result.fieldErrors ?? {});
      return;
    }
    setServerErrors({});
    setSaved(true);
    form.reset(blank());
    // fresh inputs: a re-registered number box would otherwise read its old value back into the form
    setRound((r) => r + 1);
    router.refresh();
  }

  const temposError = errors.tempos ? Object.values(errors.tempos).map((e) => (e as { message?: string })?.message).filter(Boolean).join(" ") : serverErrors.tempos?.join(" ");

  return (
    <form key={round} onSubmit={form.handleSubmit(onSubmit)} className="flex flex-col gap-4" noValidate aria-label="Log practice">
      <FormMessage message={message} />
      {saved ? <p role="status" className="rounded-xl bg-sage-soft px-3.5 py-2.5 text-sm text-ink">Practice saved. Well done.</p> : null}
      <div className="grid grid-cols-2 gap-3">
        <label className="flex flex-col gap-1 text-sm font-bold text-walnut">
          Date
          <input type="date" className={inputClass} aria-invalid={Boolean(err("practisedOn"))} aria-describedby="practisedOn-error" {...form.register("practisedOn")} />
        </label>
        <label className="flex flex-col gap-1 text-sm font-bold text-walnut">
          Minutes
          <input type="number" inputMode="numeric" className={inputClass} aria-invalid={Boolean(err("minutes"))} aria-describedby="minutes-error" {...form.register("minutes", { setValueAs: numberOrUndefined })} />
        </label>
      </div>
      <Error id="practisedOn-error" messages={err("practisedOn")} />
      <Error id="minutes-error" messages={err("minutes")} />
      <fieldset className="flex flex-col gap-2">
        <legend className="text-sm font-bold text-walnut">Tempo reached (♩ per minute; leave empty if not played)</legend>
        {drills.map((d, i) => (
          <label key={d.id} className="flex items-center justify-between gap-3 text-sm">
            <span>{i + 1}. {d.title}</span>
            <input type="number" inputMode="numeric" className={`${inputClass} w-24`} aria-label={`Tempo reached for ${d.title}`} {...form.register(`tempos.${d.id}`, { setValueAs: numberOrUndefined })} />
          </label>
        ))}
        <Error id="tempos-error" messages={temposError} />
      </fieldset>
      <fieldset>
        <legend className="text-sm font-bold text-walnut">How easy did it feel? (1 hard … 5 easy)</legend>
        <div className="mt-1 flex gap-2">
          {[1, 2, 3, 4, 5].map((n) => (
            <label key={n} className="flex items-center gap-1 rounded-full border border-line bg-card px-3 py-1.5 text-sm">
              <input type="radio" name="ease" value={n} checked={ease === n} onChange={() => form.setValue("ease", n, { shouldValidate: true })} /> {n}
            </label>
          ))}
        </div>
        <Error id="ease-error" messages={err("ease")} />
      </fieldset>
      <label className="flex flex-col gap-1 text-sm font-bold text-walnut">
        Comment
        <textarea rows={3} className={inputClass} aria-invalid={Boolean(err("comment"))} aria-describedby="comment-error" placeholder="What felt better, what still sticks?" {...form.register("comment")} />
        <span className="text-xs font-normal text-muted">Up to {COMMENT_MAX.toLocaleString("en")} characters.</span>
      </label>
      <Error id="comment-error" messages={err("comment")} />
      <Button type="submit" disabled={isSubmitting}>{isSubmitting ? "Saving…" : "Save practice"}</Button>
    </form>
  );
}
