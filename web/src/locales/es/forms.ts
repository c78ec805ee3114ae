import type { Catalogue } from '../catalogue.js';
import type { forms as en } from '../en/forms.js';

export const forms = {
  messages: {
    wrongCredentials: 'El correo o la contraseña no son correctos',
    throttled: 'Demasiados intentos: espera un minuto y vuelve a intentarlo',
    emailTaken: 'Ya existe una cuenta con este correo. Mejor entra con ella.',
    somethingWrong: 'Algo salió mal. Inténtalo de nuevo.',
  },
  fields: {
    email: 'Correo electrónico',
    password: 'Contraseña',
    name: 'Tu nombre',
    nameHint: 'Tu grupo ve este nombre.',
    newPasswordHint: 'Al menos {{count}} caracteres. Una frase corta es fácil de recordar.',
  },
  signIn: {
    title: 'Entrar',
    intro: 'Planea tu temporada, lleva el registro de tus tandas y reserva plantas en el reparto.',
    submit: 'Entrar',
    pending: 'Entrando…',
    newHere: '¿Eres nuevo en Homeground?',
    create: 'Crea una cuenta',
  },
  register: {
    title: 'Crear una cuenta',
    intro: 'Con una cuenta puedes unirte a un grupo de cultivo, llevar el registro de tus tandas y reservar plantas.',
    submit: 'Crear la cuenta',
    pending: 'Creando tu cuenta…',
    haveAccount: '¿Ya tienes una cuenta?',
    signIn: 'Entra',
    checkTitle: 'Revisa tu correo',
    checkBody:
      'Te enviamos un mensaje a {{email}}. Abre el enlace dentro de {{hours}} horas para terminar: tu cuenta se crea cuando lo abras.',
    checkElse:
      '¿No llegó nada en unos minutos? Mira en la carpeta de correo no deseado o envía el formulario otra vez. Si ya tienes una cuenta, el mensaje te lo dice.',
    again: 'Usar otra dirección',
  },
  confirm: {
    title: 'Confirmando tu dirección',
    working: 'Creando tu cuenta',
    failedTitle: 'Este enlace no funcionó',
    signUpAgain: 'Regístrate de nuevo',
    signIn: 'Entra',
  },
  account: {
    title: 'Tu cuenta',
    loading: 'Cargando tu cuenta',
    loadError: 'Los datos de tu cuenta no cargaron.',
    you: 'Tú',
    name: 'Nombre',
    email: 'Correo electrónico',
    role: 'Rol',
    roleLine: '{{title}}: {{does}}',
    joined: 'Desde',
    groups: 'Tus grupos',
    noGroupTitle: 'Todavía no estás en ningún grupo de cultivo.',
    noGroupText: 'Quien organiza un grupo te invita por correo; después el grupo aparece aquí.',
  },
} as const satisfies Catalogue<typeof en>;
