import { useId } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  createApiTokenInput,
  TOKEN_SCOPES,
  tokenScopeLabels,
  type CreateApiTokenInput,
  type CreatedApiTokenDto,
} from '@shared/schemas/api-token.ts';
import { Button } from '@/components/ui/button.tsx';
import { applyServerErrors, describe, Field, fieldMessage, FormError, inputClass } from '@/components/ui/form-bits.tsx';
import { useCreateApiToken } from '@/features/account/api/create-api-token.ts';

type FormValues = z.input<typeof createApiTokenInput>;

/** Name a new token and tick what it may do; the secret goes up to the caller to show once. */
export function NewTokenForm({ onCreated }: { onCreated: (token: CreatedApiTokenDto) => void }) {
  const create = useCreateApiToken();
  const id = useId();
  const form = useForm<FormValues, unknown, CreateApiTokenInput>({
    resolver: zodResolver(createApiTokenInput),
    defaultValues: { name: '', scopes: ['runs:write'] },
  });
  const { errors, isSubmitting } = form.formState;
  const nameError = fieldMessage(errors.name, 'Give the token a name (up to 80 characters).');
  const scopesError = fieldMessage(errors.scopes, 'Choose at least one thing the token may do.');

  const submit = form.handleSubmit(async (values) => {
    try {
      onCreated(await create.mutateAsync(values));
      form.reset();
    } catch (err) {
      applyServerErrors(err, form.setError, ['name', 'scopes']);
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="New rig token" className="space-y-3 rounded-md border border-rule p-3">
      <Field id={`${id}-name`} label="Token name" hint="Say where it lives, e.g. “bench PC, capacitive rig”." error={nameError}>
        <input
          id={`${id}-name`}
          className={inputClass}
          autoComplete="off"
          {...describe(`${id}-name`, nameError, true)}
          {...form.register('name')}
        />
      </Field>
      <fieldset aria-describedby={scopesError ? `${id}-scopes-error` : undefined}>
        <legend className="mb-1 text-sm font-medium">It may</legend>
        {TOKEN_SCOPES.map((scope) => (
          <label key={scope} className="flex items-center gap-2 text-sm">
            <input type="checkbox" value={scope} className="h-4 w-4 accent-copper" {...form.register('scopes')} />
            {tokenScopeLabels[scope]} <code className="text-xs text-ink-soft">{scope}</code>
          </label>
        ))}
        {scopesError && (
          <p id={`${id}-scopes-error`} className="mt-1 text-sm text-danger">
            {scopesError}
          </p>
        )}
      </fieldset>
      <FormError message={errors.root?.server?.message} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Creating…' : 'Create token'}
      </Button>
    </form>
  );
}
