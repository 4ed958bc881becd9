/** Submit state of a form: busy while its action runs, and the server's refusal as form feedback. */
import { ref } from 'vue';
import { formFailure, type FormFailure } from '@/api/errors';

export function useFormSubmit() {
  const busy = ref(false);
  const failure = ref<FormFailure | null>(null);

  /** Runs `action`; when it throws, keeps the refusal in `failure` and then calls `onFailure`. */
  async function run(action: () => Promise<unknown>, onFailure?: () => void): Promise<void> {
    busy.value = true;
    failure.value = null;
    try {
      await action();
    } catch (err) {
      failure.value = formFailure(err);
      onFailure?.();
    } finally {
      busy.value = false;
    }
  }

  return { busy, failure, run };
}
